import { Module } from '@nestjs/common';
import { DevOutboxController } from './dev-outbox.controller';

/** Registered only outside production (see AppModule). */
@Module({ controllers: [DevOutboxController] })
export class DevOutboxModule {}
