import { DeleteCatchHandler, LogCatchHandler, UpdateCatchHandler } from './catch.handlers';
import { ImportCatchesHandler } from './import-catches.handler';

export const CATCH_COMMAND_HANDLERS = [LogCatchHandler, UpdateCatchHandler, DeleteCatchHandler, ImportCatchesHandler];
