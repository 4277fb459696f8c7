export { deviceDb, queueWrite, sendFromForm, sendQueue, type FormSendResult } from './runtime';
export { DeviceStorageFullError } from './send-queue';
export { useSendEntries, useSendQueueDrain } from './use-send-queue';
export { versionOnceSent } from './waiting-version';
