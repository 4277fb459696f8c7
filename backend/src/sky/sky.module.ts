import { Module } from '@nestjs/common';
import { LakesModule } from '../lakes/lakes.module';
import { SkyController } from './sky.controller';
import { SkyService } from './sky.service';

/** Sun and moon context of a lake's days and catches (solunar periods), computed, never stored. */
@Module({
  imports: [LakesModule],
  controllers: [SkyController],
  providers: [SkyService],
  exports: [SkyService],
})
export class SkyModule {}
