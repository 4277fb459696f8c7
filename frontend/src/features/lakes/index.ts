export { LakesList } from './components/lakes-list';
export { LakeForm } from './components/lake-form';
export { useLakes, useLake, useDeleteLake, lakesQuery, lakeQuery, type LakeInput } from './api/lakes-api';
