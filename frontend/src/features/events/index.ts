export { EventsTable } from './components/events-table';
export { EventForm } from './components/event-form';
export { EventSummary } from './components/event-summary';
export { CompetitionDayForm } from './components/competition-day-form';
export { PracticeDaysPanel } from './components/practice-days-panel';
export { CheckInClock } from './components/check-in-clock';
export {
  useEvent,
  useEvents,
  useEventDays,
  useDeleteEvent,
  eventQuery,
  eventsQuery,
  type EventInput,
} from './api/events-api';
