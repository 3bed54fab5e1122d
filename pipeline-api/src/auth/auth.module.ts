import { Module } from '@nestjs/common';
import { MailOutboxModule } from '../mail/mail-outbox.module';
import { TokensModule } from '../tokens/tokens.module';
import { UsersModule } from '../users/users.module';
import { AuthController } from './auth.controller';
import { AccountLinksController } from './account-links.controller';
import { AuthService } from './auth.service';
import { Authenticator } from './authenticator.service';
import { PasswordResetService } from './password-reset.service';
import { SessionsService } from './sessions.service';
import { SignInThrottle } from './sign-in-throttle.service';

/** Sessions, sign-in, password reset, invitation acceptance; exports the authenticator. */
@Module({
  imports: [MailOutboxModule, TokensModule, UsersModule],
  controllers: [AuthController, AccountLinksController],
  providers: [AuthService, Authenticator, PasswordResetService, SessionsService, SignInThrottle],
  exports: [Authenticator],
})
export class AuthModule {}
