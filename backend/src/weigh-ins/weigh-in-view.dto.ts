import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, IsUUID } from 'class-validator';
import {
  EVENT_FORMATS,
  FISH_STATES,
  type BagFishVerdict,
  type BagPenaltyItem,
  type BagView,
  type ComputedBag,
  type EventFormat,
  type EventTally,
  type FishState,
  type OfficialDifference,
  type OfficialWeighIn,
  type WeighInDayView,
  type WeighInsView,
} from '@shoalbook/shared';
import { CatchViewDto } from '../catches/dto/catch-view.dto';
import { FieldContextViewDto } from '../events/dto/field-context.dto';

const nullableNumber = { type: Number, nullable: true } as const;
const nullableId = { type: String, format: 'uuid', nullable: true } as const;

/** The organiser's figures of one day, with the version to send back on the next PUT. */
export class OfficialWeighInDto implements OfficialWeighIn {
  @ApiProperty({ ...nullableNumber, description: 'lb' }) grossLb: number | null;
  @ApiProperty({ ...nullableNumber, description: 'lb' }) penaltyLb: number | null;
  @ApiProperty({ ...nullableNumber, description: 'lb' }) officialLb: number | null;
  @ApiProperty(nullableNumber) dayPlace: number | null;
  @ApiProperty({ ...nullableNumber, description: 'minutes late at check-in' }) lateMinutes: number | null;
  @ApiProperty({ ...nullableNumber, description: "the day's field size" }) fieldSize: number | null;
  @ApiProperty({ ...nullableNumber, description: "the day's winning weight, lb" }) winningLb: number | null;
  @ApiProperty({ ...nullableNumber, description: "the day's cut weight, lb" }) cutLb: number | null;
  @ApiProperty({ description: 'send it back with the next PUT; 409 "stale_version" when outdated' }) version: number;
}

export class RecordedWeighInDto extends OfficialWeighInDto {
  @ApiProperty({ format: 'uuid' }) competitionDayId: string;
}

export class BagFishVerdictDto implements BagFishVerdict {
  @ApiProperty({ format: 'uuid' }) catchId: string;
  @ApiProperty({ enum: FISH_STATES }) state: FishState;
  @ApiProperty({ description: 'in the counted bag (a counted dead fish too)' }) counted: boolean;
  @ApiProperty({ description: 'reached the scale (never a culled or released fish)' }) weighed: boolean;
  @ApiProperty({ description: 'lb' }) penaltyLb: number;
}

export class BagPenaltyItemDto implements BagPenaltyItem {
  @ApiProperty({ enum: ['dead', 'short', 'late'] }) kind: 'dead' | 'short' | 'late';
  @ApiProperty(nullableId) catchId: string | null;
  @ApiProperty({ description: 'lb' }) lb: number;
  @ApiPropertyOptional({ description: 'minutes late (late penalty only)' }) minutes?: number;
}

export class BagViewDto implements BagView {
  @ApiProperty({ type: String, nullable: true, description: "the angler of an individual event's bag" })
  anglerId: string | null;
  @ApiProperty({ type: [String], description: 'catch ids counted, highest value first' }) counted: string[];
  @ApiProperty({ type: [BagFishVerdictDto] }) fish: BagFishVerdictDto[];
  @ApiProperty({ type: [BagPenaltyItemDto] }) penalties: BagPenaltyItemDto[];
  @ApiProperty({ description: 'lb' }) grossLb: number;
  @ApiProperty({ description: 'lb' }) penaltyLb: number;
  @ApiProperty({ description: 'lb' }) netLb: number;
  @ApiProperty({ ...nullableId, description: 'the counted fish a better one would replace' }) nextToCull: string | null;
  @ApiProperty({ description: 'lb: a new legal live fish improves the bag above this (0 while not full)' })
  mustBeatLb: number;
}

export class ComputedBagDto implements ComputedBag {
  @ApiProperty({ enum: EVENT_FORMATS }) format: EventFormat;
  @ApiProperty({ type: [BagViewDto], description: 'one bag (team) or one per angler (individual)' }) bags: BagViewDto[];
  @ApiProperty({ type: [String], description: 'catch ids counted' }) counted: string[];
  @ApiProperty({ type: [BagFishVerdictDto], description: 'every catch of the day with its state' })
  fish: BagFishVerdictDto[];
  @ApiProperty({ type: [BagPenaltyItemDto] }) penalties: BagPenaltyItemDto[];
  @ApiProperty({ description: 'lb' }) grossLb: number;
  @ApiProperty({ description: 'lb' }) penaltyLb: number;
  @ApiProperty({ description: 'lb' }) netLb: number;
}

export class OfficialDifferenceDto implements OfficialDifference {
  @ApiProperty({ ...nullableNumber, description: 'official − computed, lb' }) grossLb: number | null;
  @ApiProperty({ ...nullableNumber, description: 'official − computed, lb' }) penaltyLb: number | null;
  @ApiProperty({ ...nullableNumber, description: 'official − computed, lb' }) netLb: number | null;
}

export class WeighInDayViewDto implements WeighInDayView {
  @ApiProperty({ format: 'uuid' }) competitionDayId: string;
  @ApiProperty({ example: '2024-04-12' }) date: string;
  @ApiProperty({ type: ComputedBagDto }) computed: ComputedBagDto;
  @ApiProperty({ type: OfficialWeighInDto, nullable: true }) official: OfficialWeighInDto | null;
  @ApiProperty({ type: OfficialDifferenceDto }) difference: OfficialDifferenceDto;
  @ApiProperty({ type: [CatchViewDto] }) catches: CatchViewDto[];
}

export class WeighInTotalsDto {
  @ApiProperty({ description: 'lb' }) computedNetLb: number;
  @ApiProperty({ description: 'lb: official where recorded, else computed' }) officialLb: number;
  @ApiProperty({ description: 'officialLb − computedNetLb' }) differenceLb: number;
  @ApiProperty(nullableNumber) finalPlace: number | null;
  @ApiProperty({ type: FieldContextViewDto }) field: FieldContextViewDto;
}

export class WeighInsViewDto implements WeighInsView {
  @ApiProperty({ type: [WeighInDayViewDto] }) days: WeighInDayViewDto[];
  @ApiProperty({ type: WeighInTotalsDto }) totals: WeighInTotalsDto;
}

export class EventTallyQueryDto {
  @ApiPropertyOptional({ format: 'uuid' }) @IsOptional() @IsUUID() lakeId?: string;
}

export class EventTallyDto implements EventTally {
  @ApiProperty({ format: 'uuid' }) eventId: string;
  @ApiProperty({ description: 'every catch logged on its competition days' }) fishCaught: number;
  @ApiProperty({ description: 'fish in the counted bags' }) fishCounted: number;
  @ApiProperty({ description: 'official weight where entered, else the computed net, summed over days' })
  totalLb: number;
  @ApiProperty({ description: 'every competition day has its official weight' }) allOfficial: boolean;
}
