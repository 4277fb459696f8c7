import type { CompetitionDayView, EnteredTemperature, EventView, PracticeDayView } from '@shoalbook/shared';
import { enteredOf } from '../measurements/measurements';
import type { CompetitionDay } from './competition-day.entity';
import type { PracticeDay } from './practice-day.entity';
import type { TournamentEvent } from './tournament-event.entity';

export function eventView(e: TournamentEvent): EventView {
  return {
    id: e.id,
    lakeId: e.lakeId,
    name: e.name,
    organiser: e.organiser,
    practiceDates: e.practiceDates,
    competitionDates: e.competitionDates,
    rules: {
      fishPerDay: e.fishPerDay,
      minLengthIn: e.minLengthIn,
      deadFishPenaltyLb: e.deadFishPenaltyLb,
      shortFishPenaltyLb: e.shortFishPenaltyLb,
      latePenaltyLbPerMinute: e.latePenaltyLbPerMinute,
      format: e.format,
    },
    entryFee: e.entryFee,
    payout: e.payout,
    finalPlace: e.finalPlace,
    field: { fieldSize: e.fieldSize, winningLb: e.winningLb, cutLb: e.cutLb },
    ramp: e.rampLat !== null && e.rampLon !== null ? { lat: e.rampLat, lon: e.rampLon } : null,
    notes: e.notes,
    version: e.version,
  };
}

export function practiceDayView(d: PracticeDay): PracticeDayView {
  return {
    id: d.id,
    eventId: d.eventId,
    date: d.date,
    notes: d.notes,
    waterTempF: d.waterTempF,
    entered: { waterTemp: enteredOf<EnteredTemperature['unit']>(d.waterTempValue, d.waterTempUnit) },
    version: d.version,
  };
}

export function competitionDayView(d: CompetitionDay): CompetitionDayView {
  return {
    id: d.id,
    eventId: d.eventId,
    date: d.date,
    startTime: d.startTime,
    checkInTime: d.checkInTime,
    weatherNotes: d.weatherNotes,
    waterTempF: d.waterTempF,
    entered: { waterTemp: enteredOf<EnteredTemperature['unit']>(d.waterTempValue, d.waterTempUnit) },
    version: d.version,
  };
}
