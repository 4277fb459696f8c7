import { AddFindHandler, DeleteFindHandler, UpdateFindHandler } from './find.handlers';
import { BulkDeleteFindsHandler, BulkUpdateFindsHandler } from './bulk-finds.handlers';
import { ImportFindsHandler } from './import-finds.handler';

export const FIND_COMMAND_HANDLERS = [
  AddFindHandler,
  UpdateFindHandler,
  DeleteFindHandler,
  ImportFindsHandler,
  BulkUpdateFindsHandler,
  BulkDeleteFindsHandler,
];
