import type { RouteObject } from 'react-router-dom';
import { reportPaths } from '../report-paths';

/**
 * The report screens, as children of the crew route (/crews/:crewId). Each screen is its own lazy chunk,
 * so nivo loads only when a report opens.
 */
export const reportRoutes: RouteObject[] = [
  {
    path: reportPaths.home.path,
    lazy: () => import('./reports-layout'),
    children: [
      { index: true, lazy: () => import('./reports-home') },
      { path: reportPaths.hitRates.path, lazy: () => import('./hit-rates-report') },
      { path: reportPaths.lakeComparison.path, lazy: () => import('./lake-comparison-report') },
      { path: reportPaths.events.path, lazy: () => import('./event-picker') },
      { path: reportPaths.recap.path, lazy: () => import('./event-recap-report') },
      { path: reportPaths.eventFinds.path, lazy: () => import('./paid-off-finds-report') },
      { path: reportPaths.timing.path, lazy: () => import('./timing-report') },
      { path: reportPaths.map.path, lazy: () => import('./find-map-report') },
    ],
  },
];
