import { ApiProperty } from '@nestjs/swagger';
import { FATES, SPECIES, type CatchView, type Fate, type Species } from '@shoalbook/shared';
import {
  EnteredDepthDto,
  EnteredLengthDto,
  EnteredTemperatureDto,
  EnteredWeightDto,
} from '../../measurements/entered-value.dto';
import { SkyContextDto } from '../../sky/dto/sky-view.dto';

const nullableNumber = { type: Number, nullable: true } as const;
const nullableId = { type: String, format: 'uuid', nullable: true } as const;

export class CatchEnteredViewDto {
  @ApiProperty({ type: EnteredWeightDto }) weight: EnteredWeightDto;
  @ApiProperty({ type: EnteredLengthDto, nullable: true }) length: EnteredLengthDto | null;
  @ApiProperty({ type: EnteredDepthDto, nullable: true }) depth: EnteredDepthDto | null;
  @ApiProperty({ type: EnteredTemperatureDto, nullable: true }) waterTemp: EnteredTemperatureDto | null;
}

/** A catch; lat/lon are null when positions are hidden from the caller. */
export class CatchViewDto implements CatchView {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ format: 'uuid' }) eventId: string;
  @ApiProperty({ format: 'uuid' }) competitionDayId: string;
  @ApiProperty({ example: '2024-04-12' }) competitionDate: string;
  @ApiProperty({ format: 'date-time' }) caughtAt: string;
  @ApiProperty(nullableId) findId: string | null;
  @ApiProperty({ type: String, nullable: true }) findName: string | null;
  @ApiProperty({ ...nullableNumber, description: 'm, when attributed from coordinates' }) attributionDistanceM:
    number | null;
  @ApiProperty({ ...nullableNumber, description: 'null when hidden' }) lat: number | null;
  @ApiProperty({ ...nullableNumber, description: 'null when hidden' }) lon: number | null;
  @ApiProperty({ enum: SPECIES }) species: Species;
  @ApiProperty({ ...nullableNumber, description: 'inches' }) lengthIn: number | null;
  @ApiProperty({ description: 'lb' }) weightLb: number;
  @ApiProperty() lure: string;
  @ApiProperty() technique: string;
  @ApiProperty({ ...nullableNumber, description: 'feet' }) depthFt: number | null;
  @ApiProperty({ ...nullableNumber, description: '°F' }) waterTempF: number | null;
  @ApiProperty({ enum: FATES }) fate: Fate;
  @ApiProperty() notes: string;
  @ApiProperty(nullableId) photoId: string | null;
  @ApiProperty({ description: 'weight looks implausible for the length (flagged, never changed)' })
  weightFlagged: boolean;
  @ApiProperty({ type: CatchEnteredViewDto }) entered: CatchEnteredViewDto;
  @ApiProperty({ type: SkyContextDto, nullable: true }) sky: SkyContextDto | null;
  @ApiProperty() version: number;
}
