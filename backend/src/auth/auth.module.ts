import { Module } from '@nestjs/common';
import { APP_GUARD } from '@nestjs/core';
import { BackgroundWork } from '../common/background-work';
import { CsrfService } from '../common/csrf/csrf.service';
import { UsersModule } from '../users/users.module';
import { AuthController } from './auth.controller';
import { AuthService } from './auth.service';
import { ExpiredCredentialsCleanup } from './expired-credentials-cleanup.service';
import { AUTH_COMMAND_HANDLERS } from './commands';
import { SessionGuard } from './session.guard';
import { SessionsService } from './sessions.service';

@Module({
  imports: [UsersModule],
  controllers: [AuthController],
  providers: [
    AuthService,
    BackgroundWork,
    SessionsService,
    ExpiredCredentialsCleanup,
    CsrfService,
    ...AUTH_COMMAND_HANDLERS,
    { provide: APP_GUARD, useClass: SessionGuard },
  ],
  exports: [SessionsService, CsrfService],
})
export class AuthModule {}
