import { ApiProperty } from '@nestjs/swagger';
import type { ComputedBag, OfficialWeighIn, WeighInDayView, WeighInsView } from '@shoalbook/shared';
import { CatchViewDto } from '../catches/dto/catch-view.dto';

const nullableNumber = { type: Number, nullable: true } as const;

/** The organiser's figures of one day, with the version to send back on the next PUT. */
export class OfficialWeighInDto implements OfficialWeighIn {
  @ApiProperty({ ...nullableNumber, description: 'lb' }) grossLb: number | null;
  @ApiProperty({ ...nullableNumber, description: 'lb' }) penaltyLb: number | null;
  @ApiProperty({ ...nullableNumber, description: 'lb' }) officialLb: number | null;
  @ApiProperty(nullableNumber) dayPlace: number | null;
  @ApiProperty({ ...nullableNumber, description: 'minutes late at check-in' }) lateMinutes: number | null;
  @ApiProperty({ description: 'send it back with the next PUT; 409 "stale_version" when outdated' }) version: number;
}

export class RecordedWeighInDto extends OfficialWeighInDto {
  @ApiProperty({ format: 'uuid' }) competitionDayId: string;
}

export class ComputedBagDto implements ComputedBag {
  @ApiProperty({ type: [String], description: 'catch ids counted, heaviest net first' }) counted: string[];
  @ApiProperty({ type: [String] }) culled: string[];
  @ApiProperty({ type: [String], description: 'under the minimum length (a subset of culled)' }) short: string[];
  @ApiProperty({ description: 'lb' }) grossLb: number;
  @ApiProperty({ description: 'lb' }) penaltyLb: number;
  @ApiProperty({ description: 'lb' }) netLb: number;
}

export class WeighInDayViewDto implements WeighInDayView {
  @ApiProperty({ format: 'uuid' }) competitionDayId: string;
  @ApiProperty({ example: '2024-04-12' }) date: string;
  @ApiProperty({ type: ComputedBagDto }) computed: ComputedBagDto;
  @ApiProperty({ type: OfficialWeighInDto, nullable: true }) official: OfficialWeighInDto | null;
  @ApiProperty({ type: [CatchViewDto] }) catches: CatchViewDto[];
}

export class WeighInTotalsDto {
  @ApiProperty({ description: 'lb' }) computedNetLb: number;
  @ApiProperty({ description: 'lb: official where recorded, else computed' }) officialLb: number;
  @ApiProperty(nullableNumber) finalPlace: number | null;
}

export class WeighInsViewDto implements WeighInsView {
  @ApiProperty({ type: [WeighInDayViewDto] }) days: WeighInDayViewDto[];
  @ApiProperty({ type: WeighInTotalsDto }) totals: WeighInTotalsDto;
}
