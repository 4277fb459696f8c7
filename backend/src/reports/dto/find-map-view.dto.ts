import { ApiProperty } from '@nestjs/swagger';
import { FIND_KINDS, FIND_OUTCOMES, type FindKind, type FindMapView, type FindOutcome } from '@shoalbook/shared';

type MapLake = FindMapView['lake'];
type MapFind = FindMapView['finds'][number];
type MapCatch = FindMapView['catches'][number];

const metres = (axis: string) =>
  ({
    type: Number,
    nullable: true,
    description: `m ${axis} of the lake’s reference point; null when positions are hidden`,
  }) as const;

export class FindMapLakeDto implements MapLake {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() name: string;
  @ApiProperty({ minimum: -90, maximum: 90, description: 'reference point' }) lat: number;
  @ApiProperty({ minimum: -180, maximum: 180 }) lon: number;
}

export class MapFindDto implements MapFind {
  @ApiProperty({ format: 'uuid' }) findId: string;
  @ApiProperty() name: string;
  @ApiProperty(metres('east')) xM: number | null;
  @ApiProperty(metres('north')) yM: number | null;
  @ApiProperty({ enum: FIND_KINDS }) kind: FindKind;
  @ApiProperty({ enum: FIND_OUTCOMES }) outcome: FindOutcome;
  @ApiProperty({ type: 'integer', minimum: 0 }) fishCount: number;
  @ApiProperty({ minimum: 0, description: 'lb' }) weightLb: number;
}

export class MapCatchDto implements MapCatch {
  @ApiProperty({ format: 'uuid' }) catchId: string;
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) findId: string | null;
  @ApiProperty({
    ...metres('east'),
    description: 'm east; the find’s position when the catch has none; null when hidden or unknown',
  })
  xM: number | null;
  @ApiProperty({ ...metres('north'), description: 'm north; as xM' }) yM: number | null;
  @ApiProperty({ description: 'lb' }) weightLb: number;
}

export class FindMapViewDto implements FindMapView {
  @ApiProperty({ type: FindMapLakeDto }) lake: FindMapLakeDto;
  @ApiProperty({ description: 'true: xM/yM are null (viewer, crew setting)' }) positionsHidden: boolean;
  @ApiProperty({ type: [MapFindDto] }) finds: MapFindDto[];
  @ApiProperty({ type: [MapCatchDto], description: 'at most 20,000, by time' }) catches: MapCatchDto[];
}
