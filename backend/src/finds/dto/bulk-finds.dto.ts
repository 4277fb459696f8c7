import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { FIND_KINDS, type FindKind } from '@shoalbook/shared';
import {
  ArrayMaxSize,
  ArrayMinSize,
  ArrayUnique,
  IsArray,
  IsIn,
  IsOptional,
  IsString,
  IsUUID,
  MaxLength,
  ValidateIf,
} from 'class-validator';
import { NoControlCharacters } from '../../common/dto/no-control-characters';

/** Enough for the largest lake's imported waypoints in one go (a GPX import takes up to 50,000). */
export const BULK_FINDS_MAX = 50_000;

export class BulkFindsDto {
  @ApiProperty({ type: [String], format: 'uuid', minItems: 1, maxItems: BULK_FINDS_MAX, uniqueItems: true })
  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(BULK_FINDS_MAX)
  @ArrayUnique()
  @IsUUID('all', { each: true })
  findIds: string[];
}

/** What to set on every chosen find; at least one of kind and eventId. */
export class BulkUpdateFindsDto extends BulkFindsDto {
  @ApiPropertyOptional({ enum: FIND_KINDS }) @IsOptional() @IsIn([...FIND_KINDS]) kind?: FindKind;
  @ApiPropertyOptional({ description: "a sub-kind of `kind` ('' for none); only with kind" })
  @IsOptional()
  @IsString()
  @NoControlCharacters()
  @MaxLength(40)
  subKind?: string;
  @ApiPropertyOptional({ format: 'uuid', nullable: true, description: 'the event on the same lake, or null for none' })
  @ValidateIf((_, v) => v !== null && v !== undefined)
  @IsUUID()
  eventId?: string | null;
}

export class BulkUpdateFindsResultDto {
  @ApiProperty() updated: number;
}

export class BulkDeleteFindsResultDto {
  @ApiProperty() deleted: number;
  @ApiProperty({ description: 'catches that kept their data and lost the find' }) catchesUnattached: number;
  @ApiProperty({ description: "stops that stay at the find's position with no find" }) stopsUnattached: number;
}
