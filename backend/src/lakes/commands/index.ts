import { CreateLakeHandler, DeleteLakeHandler, UpdateLakeHandler } from './lake.handlers';

export const LAKE_COMMAND_HANDLERS = [CreateLakeHandler, UpdateLakeHandler, DeleteLakeHandler];
