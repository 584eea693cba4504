import { PartialType } from '@nestjs/swagger';
import { CreateStopDto } from './create-stop.dto';

/**
 * Any field of a stop. Null is checked, not skipped, so `name: null` is refused while the nullable fields (phone,
 * e-mail, sharpener, manager) clear with null; latitude and longitude both null remove the pin.
 */
export class UpdateStopDto extends PartialType(CreateStopDto, { skipNullProperties: false }) {}
