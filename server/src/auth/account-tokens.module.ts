import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { RefreshToken } from './entities/refresh-token.entity';
import { UserToken } from './entities/user-token.entity';
import { RefreshTokensService } from './refresh-tokens.service';
import { UserTokensService } from './user-tokens.service';

/** Refresh tokens and e-mailed links; shared by auth (sign-in) and users (invitations, deactivation). */
@Module({
  imports: [TypeOrmModule.forFeature([RefreshToken, UserToken])],
  providers: [RefreshTokensService, UserTokensService],
  exports: [RefreshTokensService, UserTokensService],
})
export class AccountTokensModule {}
