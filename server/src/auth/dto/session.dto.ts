import { ApiProperty } from '@nestjs/swagger';
import { UserSummaryDto } from '../../users/dto/user-response.dto';

export class SessionDto {
  @ApiProperty({ description: 'Bearer token for the API, valid 15 minutes' })
  accessToken: string;

  @ApiProperty({ type: UserSummaryDto })
  user: UserSummaryDto;
}

export class LinkInfoDto {
  @ApiProperty({ enum: ['invite', 'reset'] }) purpose: 'invite' | 'reset';
  @ApiProperty() email: string;
  @ApiProperty() name: string;
}

export class MessageDto {
  @ApiProperty() message: string;
}
