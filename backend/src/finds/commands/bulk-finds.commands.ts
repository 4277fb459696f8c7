import { Command } from '@nestjs/cqrs';
import type { BulkDeleteFindsResult, BulkUpdateFindsResult } from '@shoalbook/shared';
import type { CrewAccess } from '../../crews/access/request-context';
import type { BulkUpdateFindsDto } from '../dto/bulk-finds.dto';

/** Set the kind (and sub-kind) or the event of many finds at once: all of them or none. */
export class BulkUpdateFindsCommand extends Command<BulkUpdateFindsResult> {
  constructor(
    readonly access: CrewAccess,
    readonly input: BulkUpdateFindsDto,
  ) {
    super();
  }
}

/** Delete many finds at once, as DeleteFindCommand does one: their catches and stops stay, unattached. */
export class BulkDeleteFindsCommand extends Command<BulkDeleteFindsResult> {
  constructor(
    readonly access: CrewAccess,
    readonly findIds: string[],
  ) {
    super();
  }
}
