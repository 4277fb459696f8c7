import { DeleteStopHandler, LogStopHandler, UpdateStopHandler } from './stop.handlers';

export const STOP_COMMAND_HANDLERS = [LogStopHandler, UpdateStopHandler, DeleteStopHandler];
