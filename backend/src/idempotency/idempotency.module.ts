import { Module } from '@nestjs/common';
import { APP_INTERCEPTOR } from '@nestjs/core';
import { IdempotencyKeyCleanup } from './idempotency-key-cleanup.service';
import { IdempotencyInterceptor } from './idempotency.interceptor';

/** Exactly-once journal writes for any client that sends an Idempotency-Key. */
@Module({
  providers: [{ provide: APP_INTERCEPTOR, useClass: IdempotencyInterceptor }, IdempotencyKeyCleanup],
  exports: [IdempotencyKeyCleanup],
})
export class IdempotencyModule {}
