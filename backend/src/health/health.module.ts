import { Module } from '@nestjs/common';
import { ProjectionsModule } from '../projections/projections.module';
import { HealthController } from './health.controller';

@Module({ imports: [ProjectionsModule], controllers: [HealthController] })
export class HealthModule {}
