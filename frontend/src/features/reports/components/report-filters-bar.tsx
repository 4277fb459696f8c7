import { FilterRemoveIcon } from '@primer/octicons-react';
import { Button, FormControl, Select, TextInput } from '@primer/react';
import type { EventView, LakeView } from '@shoalbook/shared';
import { SEASONS, SEASON_LABELS, type ReportFilters } from '../api/report-filters';
import styles from './reports.module.css';

export interface ReportFiltersBarProps {
  filters: ReportFilters;
  lakes: LakeView[];
  events: EventView[];
  onChange: (change: Partial<Record<keyof ReportFilters, string | number | undefined>>) => void;
  onClear: () => void;
  /** On an event's own report the event comes from the address; choosing another opens that one's report. */
  onEventChange?: (eventId: string | undefined) => void;
  /** The event of the address, shown selected when onEventChange is given. */
  currentEventId?: string;
  /** Which filters this report uses (others are hidden, not silently ignored). */
  show?: ReadonlyArray<keyof ReportFilters>;
}

const ALL: ReadonlyArray<keyof ReportFilters> = ['lakeId', 'eventId', 'season', 'year', 'from', 'to'];

/** Years that have a competition day, newest first. */
function competitionYears(events: EventView[]): number[] {
  const years = new Set<number>();
  for (const event of events) for (const date of event.competitionDates) years.add(Number(date.slice(0, 4)));
  return [...years].sort((a, b) => b - a);
}

/** "Spring Open (2024)", or the name alone when it already says its year. */
function eventOptionLabel(event: EventView): string {
  const year = event.competitionDates[0]?.slice(0, 4);
  return !year || event.name.includes(year) ? event.name : `${event.name} (${year})`;
}

/** The filters every report shares: lake, event, season, year and a range of competition dates. */
export function ReportFiltersBar({
  filters,
  lakes,
  events,
  onChange,
  onClear,
  onEventChange,
  currentEventId,
  show = ALL,
}: ReportFiltersBarProps) {
  const lakeEvents = filters.lakeId ? events.filter((e) => e.lakeId === filters.lakeId) : events;
  const years = competitionYears(events);
  const shown = new Set(show);
  const eventValue = onEventChange ? (currentEventId ?? '') : (filters.eventId ?? '');
  const anySet = Object.values(filters).some((v) => v !== undefined);

  return (
    <form
      className={`${styles.filters} sb-no-print`}
      aria-label="Report filters"
      role="search"
      onSubmit={(e) => e.preventDefault()}
    >
      {shown.has('lakeId') ? (
        <FormControl>
          <FormControl.Label>Lake</FormControl.Label>
          <Select value={filters.lakeId ?? ''} onChange={(e) => onChange({ lakeId: e.target.value || undefined })}>
            <Select.Option value="">All lakes</Select.Option>
            {lakes.map((lake) => (
              <Select.Option key={lake.id} value={lake.id}>
                {lake.name}
              </Select.Option>
            ))}
          </Select>
        </FormControl>
      ) : null}
      {shown.has('eventId') ? (
        <FormControl>
          <FormControl.Label>Event</FormControl.Label>
          <Select
            value={eventValue}
            onChange={(e) =>
              onEventChange
                ? onEventChange(e.target.value || undefined)
                : onChange({ eventId: e.target.value || undefined })
            }
          >
            <Select.Option value="">{onEventChange ? 'Choose an event' : 'All events'}</Select.Option>
            {lakeEvents.map((event) => (
              <Select.Option key={event.id} value={event.id}>
                {eventOptionLabel(event)}
              </Select.Option>
            ))}
          </Select>
        </FormControl>
      ) : null}
      {shown.has('season') ? (
        <FormControl>
          <FormControl.Label>Season</FormControl.Label>
          <Select value={filters.season ?? ''} onChange={(e) => onChange({ season: e.target.value || undefined })}>
            <Select.Option value="">Any season</Select.Option>
            {SEASONS.map((season) => (
              <Select.Option key={season} value={season}>
                {SEASON_LABELS[season]}
              </Select.Option>
            ))}
          </Select>
        </FormControl>
      ) : null}
      {shown.has('year') ? (
        <FormControl>
          <FormControl.Label>Year</FormControl.Label>
          <Select
            value={filters.year ? String(filters.year) : ''}
            onChange={(e) => onChange({ year: e.target.value || undefined })}
          >
            <Select.Option value="">Any year</Select.Option>
            {years.map((year) => (
              <Select.Option key={year} value={String(year)}>
                {year}
              </Select.Option>
            ))}
          </Select>
        </FormControl>
      ) : null}
      {shown.has('from') ? (
        <FormControl>
          <FormControl.Label>Fished from</FormControl.Label>
          <TextInput
            type="date"
            value={filters.from ?? ''}
            max={filters.to}
            onChange={(e) => onChange({ from: e.target.value || undefined })}
          />
        </FormControl>
      ) : null}
      {shown.has('to') ? (
        <FormControl>
          <FormControl.Label>to</FormControl.Label>
          <TextInput
            type="date"
            value={filters.to ?? ''}
            min={filters.from}
            onChange={(e) => onChange({ to: e.target.value || undefined })}
          />
        </FormControl>
      ) : null}
      <div className={styles.filtersEnd}>
        <Button leadingVisual={FilterRemoveIcon} onClick={onClear} disabled={!anySet}>
          Clear filters
        </Button>
      </div>
    </form>
  );
}
