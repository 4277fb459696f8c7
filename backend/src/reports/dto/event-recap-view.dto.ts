import { ApiProperty } from '@nestjs/swagger';
import {
  FATES,
  FISH_STATES,
  FIND_KINDS,
  SPECIES,
  type EventRecapView,
  type EventTotals,
  type Fate,
  type FindKind,
  type FishState,
  type RecapDay,
  type RecapFish,
  type StandingView,
  type ReportFish,
  type Species,
} from '@shoalbook/shared';
import { EventRulesViewDto } from '../../events/dto/event-view.dto';
import { FieldContextViewDto } from '../../events/dto/field-context.dto';
import { BagPenaltyItemDto, OfficialDifferenceDto } from '../../weigh-ins/weigh-in-view.dto';
import { RateDto } from './rate-view.dto';

type Recap = EventRecapView;
type ProducingFind = Recap['producingFinds'][number];
type TimelinePoint = Recap['timeline'][number];
const nullableNumber = { type: Number, nullable: true } as const;
const date = { example: '2025-10-10', description: 'lake-local YYYY-MM-DD' } as const;

/** A fish in a report (never its position). */
export class ReportFishDto implements ReportFish {
  @ApiProperty({ format: 'uuid' }) catchId: string;
  @ApiProperty({ format: 'date-time' }) caughtAt: string;
  @ApiProperty({ description: 'lb' }) weightLb: number;
  @ApiProperty({ ...nullableNumber, description: 'inches' }) lengthIn: number | null;
  @ApiProperty({ enum: SPECIES }) species: Species;
  @ApiProperty({ enum: FATES }) fate: Fate;
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) findId: string | null;
  @ApiProperty({ type: String, nullable: true }) findName: string | null;
  @ApiProperty() lure: string;
  @ApiProperty({ ...date, description: 'the competition day (lake-local)' }) day: string;
}

export class RecapFishDto extends ReportFishDto implements RecapFish {
  @ApiProperty({ enum: FISH_STATES, description: 'what the bag rule made of the fish' }) state: FishState;
  @ApiProperty({ description: 'reached the scale (counted fish and short fish brought in)' }) weighed: boolean;
  @ApiProperty({ description: 'lb' }) penaltyLb: number;
}

export class StandingViewDto implements StandingView {
  @ApiProperty({ type: String, nullable: true, example: '26th of 180 (top 15 %)' }) place: string | null;
  @ApiProperty({ ...nullableNumber, description: 'share of the field at or above the place, % rounded up' })
  topPercent: number | null;
  @ApiProperty({ ...nullableNumber, description: 'lb behind the winning weight' }) behindWinnerLb: number | null;
  @ApiProperty({ ...nullableNumber, description: 'lb over the cut weight (negative: short of it)' })
  overCutLb: number | null;
  @ApiProperty({ type: [String] }) readings: string[];
}

export class RecapOfficialDto implements NonNullable<RecapDay['official']> {
  @ApiProperty({ ...nullableNumber, description: 'lb' }) grossLb: number | null;
  @ApiProperty({ ...nullableNumber, description: 'lb' }) penaltyLb: number | null;
  @ApiProperty({ ...nullableNumber, description: 'lb' }) officialLb: number | null;
  @ApiProperty({ type: 'integer', nullable: true }) dayPlace: number | null;
  @ApiProperty({ type: 'integer', nullable: true, description: 'minutes late at check-in' }) lateMinutes: number | null;
}

export class RecapDayDto implements RecapDay {
  @ApiProperty({ format: 'uuid' }) competitionDayId: string;
  @ApiProperty(date) date: string;
  @ApiProperty({ type: [ReportFishDto], description: 'the bag under the event’s rules, heaviest first' })
  counted: ReportFishDto[];
  @ApiProperty({ type: [RecapFishDto], description: 'every fish of the day with its state' }) fish: RecapFishDto[];
  @ApiProperty({ type: [BagPenaltyItemDto] }) penalties: BagPenaltyItemDto[];
  @ApiProperty({ description: 'lb' }) grossLb: number;
  @ApiProperty({ description: 'lb' }) penaltyLb: number;
  @ApiProperty({ description: 'lb' }) netLb: number;
  @ApiProperty({ type: RecapOfficialDto, nullable: true, description: 'the organiser’s figures, when recorded' })
  official: RecapOfficialDto | null;
  @ApiProperty({ type: OfficialDifferenceDto, description: 'official − computed, beside both' })
  difference: OfficialDifferenceDto;
  @ApiProperty({ type: 'integer', nullable: true }) dayPlace: number | null;
  @ApiProperty({ type: FieldContextViewDto, description: 'the day’s field from the results sheet' })
  field: FieldContextViewDto;
  @ApiProperty({ type: StandingViewDto }) standing: StandingViewDto;
}

export class RecapLakeDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() name: string;
  @ApiProperty({ example: 'America/Chicago' }) timeZone: string;
}

export class RecapDatesDto {
  @ApiProperty({ type: [String], description: 'lake-local YYYY-MM-DD' }) practice: string[];
  @ApiProperty({ type: [String], description: 'lake-local YYYY-MM-DD' }) competition: string[];
}

export class RecapEventDto implements Omit<Recap['event'], 'rules'> {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() name: string;
  @ApiProperty({ type: RecapLakeDto }) lake: RecapLakeDto;
  @ApiProperty({ type: RecapDatesDto }) dates: RecapDatesDto;
  @ApiProperty({ type: EventRulesViewDto }) rules: EventRulesViewDto;
  @ApiProperty({ type: 'integer', nullable: true }) finalPlace: number | null;
  @ApiProperty({ type: FieldContextViewDto }) field: FieldContextViewDto;
}

export class RecapTotalsDto implements EventTotals {
  @ApiProperty({ description: 'lb' }) netLb: number;
  @ApiProperty({ description: 'lb: per day the official weight where recorded, else the computed net' })
  officialLb: number;
  @ApiProperty({ description: 'officialLb − netLb' }) differenceLb: number;
  @ApiProperty({ type: 'integer', nullable: true }) finalPlace: number | null;
  @ApiProperty({ type: StandingViewDto, description: 'the final place and total against the event’s field' })
  standing: StandingViewDto;
}

export class ProducingFindDto implements ProducingFind {
  @ApiProperty({ format: 'uuid' }) findId: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: FIND_KINDS }) kind: FindKind;
  @ApiProperty() subKind: string;
  @ApiProperty({ type: 'integer', minimum: 1 }) fishCount: number;
  @ApiProperty({ minimum: 0, description: 'lb' }) weightLb: number;
}

export class TimelinePointDto implements TimelinePoint {
  @ApiProperty({ format: 'uuid' }) catchId: string;
  @ApiProperty({ format: 'date-time' }) caughtAt: string;
  @ApiProperty({ description: 'lb' }) weightLb: number;
  @ApiProperty({ description: 'lb: the day’s best legal bag after this fish' }) cumulativeBagLb: number;
  @ApiProperty(date) day: string;
}

export class EventRecapViewDto implements Recap {
  @ApiProperty({ type: RecapEventDto }) event: RecapEventDto;
  @ApiProperty({ type: [RecapDayDto] }) days: RecapDayDto[];
  @ApiProperty({ type: RecapTotalsDto }) totals: RecapTotalsDto;
  @ApiProperty({ type: [ProducingFindDto], description: 'heaviest first' }) producingFinds: ProducingFindDto[];
  @ApiProperty({ type: [TimelinePointDto], description: 'every fish by time' }) timeline: TimelinePointDto[];
  @ApiProperty({ type: ReportFishDto, nullable: true }) bigFish: ReportFishDto | null;
  @ApiProperty({ type: 'integer', minimum: 0, description: 'every fate' }) fishCaught: number;
  @ApiProperty({ type: 'integer', minimum: 0, description: 'in a day’s counted bag' }) fishCounted: number;
  @ApiProperty({ type: 'integer', minimum: 0 }) findsFished: number;
  @ApiProperty({ type: 'integer', minimum: 0, description: 'time on finds over the stops, whole seconds' })
  secondsFished: number;
  @ApiProperty({ type: Number, nullable: true, description: 'fish per hour fished; null without timed stops' })
  fishPerHour: number | null;
  @ApiProperty({ description: 'catches but no stops: fished is derived from the catches, with no time fished' })
  derivedFromCatches: boolean;
  @ApiProperty({ type: 'integer', minimum: 0, description: 'finds marked in the event’s practice' })
  findsPracticed: number;
  @ApiProperty({ type: RateDto, description: 'practice finds that produced a fish / practice finds' })
  shareOfPracticePaidOff: RateDto;
  @ApiProperty({ type: [String] }) readings: string[];
}
