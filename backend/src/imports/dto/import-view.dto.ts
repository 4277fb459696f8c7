import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import type {
  CatchImportPreview,
  CatchImportResult,
  CatchImportRow,
  CatchDuplicateOf,
  DuplicateOf,
  FindImportPreview,
  FindImportResult,
  FindImportRow,
  FindKind,
  ImportRowError,
} from '@shoalbook/shared';
import { FIND_KINDS } from '@shoalbook/shared';

const nullableNumber = { type: Number, nullable: true } as const;

export class DuplicateOfDto implements DuplicateOf {
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) findId: string | null;
  @ApiProperty() name: string;
  @ApiProperty({ description: 'm' }) distanceM: number;
  @ApiPropertyOptional({ description: 'the match is an earlier row of the same file' }) inFile?: boolean;
  @ApiPropertyOptional() rowIndex?: number;
}

export class FindImportRowDto implements FindImportRow {
  @ApiProperty() index: number;
  @ApiProperty() name: string;
  @ApiProperty(nullableNumber) lat: number | null;
  @ApiProperty(nullableNumber) lon: number | null;
  @ApiProperty({ type: String, format: 'date-time', nullable: true }) markedAt: string | null;
  @ApiProperty(nullableNumber) depthFt: number | null;
  @ApiProperty({
    enum: FIND_KINDS,
    nullable: true,
    description: "the kind the file's <type> names; null: the import's kind applies",
  })
  kind: FindKind | null;
  @ApiProperty({ description: "the waypoint's <desc>, kept as the find's notes" }) notes: string;
  @ApiProperty({ type: String, nullable: true }) error: string | null;
  @ApiProperty({ type: DuplicateOfDto, nullable: true }) duplicateOf: DuplicateOfDto | null;
}

export class FindImportPreviewDto implements FindImportPreview {
  @ApiProperty({ type: [FindImportRowDto] }) rows: FindImportRowDto[];
  @ApiProperty() accepted: number;
  @ApiProperty() rejected: number;
  @ApiProperty() duplicates: number;
}

export class ImportRowErrorDto implements ImportRowError {
  @ApiProperty() index: number;
  @ApiPropertyOptional({ description: '1-based CSV line (header = 1)' }) line?: number;
  @ApiPropertyOptional() field?: string;
  @ApiProperty() message: string;
}

export class FindImportResultDto implements FindImportResult {
  @ApiProperty() imported: number;
  @ApiProperty() skipped: number;
  @ApiProperty({ type: [ImportRowErrorDto] }) errors: ImportRowErrorDto[];
}

export class FieldMessageDto {
  @ApiProperty() field: string;
  @ApiProperty() message: string;
}

export class CatchDuplicateOfDto implements CatchDuplicateOf {
  @ApiProperty({ type: String, format: 'uuid', nullable: true, description: 'the logged catch; null: an earlier line' })
  catchId: string | null;
  @ApiPropertyOptional({ description: 'the earlier line of the same file' }) line?: number;
}

export class CatchImportRowDto implements CatchImportRow {
  @ApiProperty() index: number;
  @ApiProperty() line: number;
  @ApiProperty({ type: String, format: 'date-time', nullable: true }) caughtAt: string | null;
  @ApiProperty({ type: String, nullable: true }) species: string | null;
  @ApiProperty(nullableNumber) weightLb: number | null;
  @ApiProperty(nullableNumber) lengthIn: number | null;
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) findId: string | null;
  @ApiProperty(nullableNumber) attributionDistanceM: number | null;
  @ApiProperty() weightFlagged: boolean;
  @ApiProperty({ type: () => CatchDuplicateOfDto, nullable: true }) duplicateOf: CatchDuplicateOfDto | null;
  @ApiProperty({ type: [FieldMessageDto] }) errors: FieldMessageDto[];
}

export class CatchImportPreviewDto implements CatchImportPreview {
  @ApiProperty({ type: [CatchImportRowDto] }) rows: CatchImportRowDto[];
  @ApiProperty() accepted: number;
  @ApiProperty() rejected: number;
  @ApiProperty({ description: 'rows repeating a logged catch or an earlier line; skipped on import' })
  duplicates: number;
}

export class CatchImportResultDto implements CatchImportResult {
  @ApiProperty() imported: number;
  @ApiProperty({ description: 'rows skipped as duplicates' }) skipped: number;
  @ApiProperty({ type: [ImportRowErrorDto] }) errors: ImportRowErrorDto[];
}
