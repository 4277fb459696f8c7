import { RecordWeighInHandler } from './record-weigh-in.handler';

export const WEIGH_IN_COMMAND_HANDLERS = [RecordWeighInHandler];
