import { RefreshToken } from '../auth/entities/refresh-token.entity';
import { UserToken } from '../auth/entities/user-token.entity';
import { RateCardVersion } from '../rates/entities/rate-card-version.entity';
import { User } from '../users/entities/user.entity';

/** Every entity, for the CLI data source; the app registers them through each module's forFeature. */
export const entities = [User, RefreshToken, UserToken, RateCardVersion];
