import { Module } from '@nestjs/common';
import { SendRecapEmailHandler } from './commands/send-recap-email.handler';
import { REPORT_QUERY_HANDLERS } from './queries';
import { ReportsController } from './reports.controller';

/** The report API: query handlers over the read models, and the recap e-mail. */
@Module({
  controllers: [ReportsController],
  providers: [...REPORT_QUERY_HANDLERS, SendRecapEmailHandler],
})
export class ReportsModule {}
