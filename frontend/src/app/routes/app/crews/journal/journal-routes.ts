import type { RouteObject } from 'react-router-dom';
import { journalPaths } from '../../../../../config/journal-paths';

/** The journal's screens, children of /crews/:crewId; each a lazy module of its own. */
export const journalRoutes: RouteObject[] = [
  { path: journalPaths.lakes.path, lazy: () => import('./lakes') },
  { path: journalPaths.newLake.path, lazy: () => import('./lake-new') },
  { path: journalPaths.lake.path, lazy: () => import('./lake') },
  { path: journalPaths.editLake.path, lazy: () => import('./lake-edit') },
  { path: journalPaths.events.path, lazy: () => import('./events') },
  { path: journalPaths.newEvent.path, lazy: () => import('./event-new') },
  { path: journalPaths.event.path, lazy: () => import('./event') },
  { path: journalPaths.editEvent.path, lazy: () => import('./event-edit') },
  { path: journalPaths.finds.path, lazy: () => import('./finds') },
  { path: journalPaths.newFind.path, lazy: () => import('./find-new') },
  { path: journalPaths.find.path, lazy: () => import('./find') },
  { path: journalPaths.editFind.path, lazy: () => import('./find-edit') },
  { path: journalPaths.catches.path, lazy: () => import('./catches') },
  { path: journalPaths.catch.path, lazy: () => import('./catch') },
  { path: journalPaths.import.path, lazy: () => import('./import') },
];
