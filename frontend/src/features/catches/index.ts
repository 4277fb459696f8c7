export { CatchEntryForm } from './components/catch-entry-form';
export { CatchEditForm } from './components/catch-edit-form';
export { CatchFacts, CatchSide } from './components/catch-detail';
export { CatchHistory } from './components/catch-history';
export { CatchesTable } from './components/catches-table';
export { catchName } from './components/catch-names';
export { findOptionLabel } from './components/catch-values';
export {
  useCatches,
  useCatch,
  useCatchHistory,
  useLogCatch,
  useUpdateCatch,
  useDeleteCatch,
  type CatchInput,
  type CatchChanges,
} from './api/catches-api';
