import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  FIND_KINDS,
  FIND_SOURCES,
  FOUND_HOW,
  VEGETATION_DENSITIES,
  type FindKind,
  type FindSource,
  type FindView,
  type FoundHow,
  type HardnessGrade,
  type VegetationDensity,
} from '@shoalbook/shared';
import { EnteredDepthDto, EnteredTemperatureDto } from '../../measurements/entered-value.dto';
import { SkyContextDto } from '../../sky/dto/sky-view.dto';

const nullableNumber = { type: Number, nullable: true } as const;

export class FindEnteredViewDto {
  @ApiProperty({ type: EnteredDepthDto, nullable: true }) depth: EnteredDepthDto | null;
  @ApiProperty({ type: EnteredTemperatureDto, nullable: true }) waterTemp: EnteredTemperatureDto | null;
}

/** A find; lat/lon are null when positions are hidden from the caller. */
export class FindViewDto implements FindView {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ format: 'uuid' }) lakeId: string;
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) eventId: string | null;
  @ApiProperty({ type: String, nullable: true, example: '2024-04-10' }) practiceDate: string | null;
  @ApiProperty() name: string;
  @ApiProperty({ type: String, format: 'date-time', nullable: true }) markedAt: string | null;
  @ApiProperty({ ...nullableNumber, description: 'null when hidden' }) lat: number | null;
  @ApiProperty({ ...nullableNumber, description: 'null when hidden' }) lon: number | null;
  @ApiProperty({ ...nullableNumber, description: 'feet' }) depthFt: number | null;
  @ApiProperty({ enum: FIND_KINDS }) kind: FindKind;
  @ApiProperty() subKind: string;
  @ApiProperty({ ...nullableNumber, minimum: 1, maximum: 5 }) hardness: HardnessGrade | null;
  @ApiProperty({ enum: VEGETATION_DENSITIES, nullable: true }) vegetationDensity: VegetationDensity | null;
  @ApiProperty() baitSeen: boolean;
  @ApiProperty(nullableNumber) fishMarked: number | null;
  @ApiProperty({ ...nullableNumber, description: 'kHz' }) frequencyKhz: number | null;
  @ApiProperty({ enum: FOUND_HOW, nullable: true }) foundHow: FoundHow | null;
  @ApiProperty({ ...nullableNumber, description: '°F' }) waterTempF: number | null;
  @ApiProperty() notes: string;
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) photoId: string | null;
  @ApiProperty({ enum: FIND_SOURCES }) source: FindSource;
  @ApiProperty({ type: FindEnteredViewDto }) entered: FindEnteredViewDto;
  @ApiPropertyOptional({ type: SkyContextDto, nullable: true, description: 'null when markedAt is unknown' })
  sky: SkyContextDto | null;
  @ApiProperty() version: number;
}
