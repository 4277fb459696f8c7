export { StopsPanel, useOpenStop, openStopOf } from './components/stops-panel';
export { useDayStops, useLogStop, useUpdateStop, useDeleteStop } from './api/stops-api';
