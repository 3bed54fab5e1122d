import { Module } from '@nestjs/common';
import { MailOutboxModule } from '../mail/mail-outbox.module';
import { AdminUsersController } from './admin-users.controller';
import { AdminUsersService } from './admin-users.service';
import { InvitationsService } from './invitations.service';

/** Users and invitations (admin routes); exports invitations for the accept routes of auth. */
@Module({
  imports: [MailOutboxModule],
  controllers: [AdminUsersController],
  providers: [AdminUsersService, InvitationsService],
  exports: [InvitationsService],
})
export class UsersModule {}
