export { CatchEntryForm, findOptionLabel } from './components/catch-entry-form';
export { CatchesTable } from './components/catches-table';
export { useCatches, useLogCatch, useDeleteCatch, type CatchInput } from './api/catches-api';
