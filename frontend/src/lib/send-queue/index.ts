export { deviceDb, queueWrite, sendQueue } from './runtime';
export { DeviceStorageFullError } from './send-queue';
export { useSendEntries, useSendQueueDrain } from './use-send-queue';
