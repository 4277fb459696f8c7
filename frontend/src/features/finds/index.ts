export { FindsTable } from './components/finds-table';
export { FindForm } from './components/find-form';
export { FindDetail } from './components/find-detail';
export { FindsBulkBar } from './components/finds-bulk-bar';
export { useFinds, useFind, useDeleteFind, findsQuery } from './api/finds-api';
