import { Module } from '@nestjs/common';
import { AdminTokensController } from './admin-tokens.controller';
import { TokensService } from './tokens.service';

/** Pipeline tokens; exports the bearer check the authenticator uses. */
@Module({
  controllers: [AdminTokensController],
  providers: [TokensService],
  exports: [TokensService],
})
export class TokensModule {}
