export { GpxImport } from './components/gpx-import';
export { GpxPreviewTable } from './components/gpx-preview-table';
export { CatchesCsvImport } from './components/catches-csv-import';
export { ExportButtons } from './components/export-buttons';
