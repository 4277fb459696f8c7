import { Module } from '@nestjs/common';
import { DevOutboxController } from './dev-outbox.controller';

/** Registered only in the development profile (see AppModule). */
@Module({ controllers: [DevOutboxController] })
export class DevOutboxModule {}
