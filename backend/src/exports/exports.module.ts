import { Module } from '@nestjs/common';
import { CatchesModule } from '../catches/catches.module';
import { FindsModule } from '../finds/finds.module';
import { ExportsController } from './exports.controller';
import { JournalExportService } from './journal-export.service';

/** The crew's journal out as CSV and its finds as GPX. */
@Module({
  imports: [CatchesModule, FindsModule],
  controllers: [ExportsController],
  providers: [JournalExportService],
})
export class ExportsModule {}
