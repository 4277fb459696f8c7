import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { FIND_KINDS, type FindKind } from '@shoalbook/shared';
import { IsBoolean, IsIn, IsOptional, IsString, IsUUID, MaxLength } from 'class-validator';
import { NoControlCharacters } from '../../common/dto/no-control-characters';

/** Options of a GPX import, as query parameters or multipart fields (strings on the wire). */
export class FindImportOptionsDto {
  @ApiPropertyOptional({ format: 'uuid', description: 'required' }) @IsOptional() @IsUUID() lakeId?: string;
  @ApiPropertyOptional({ format: 'uuid' }) @IsOptional() @IsUUID() eventId?: string;
  @ApiPropertyOptional({ enum: FIND_KINDS, default: 'other' }) @IsOptional() @IsIn([...FIND_KINDS]) kind?: FindKind;
  @ApiPropertyOptional({ default: '' })
  @IsOptional()
  @IsString()
  @NoControlCharacters()
  @MaxLength(40)
  subKind?: string;
  @ApiPropertyOptional({ default: true })
  @IsOptional()
  @Transform(({ value }: { value: unknown }) =>
    value === 'true' || value === '1' ? true : value === 'false' || value === '0' ? false : value,
  )
  @IsBoolean()
  skipDuplicates?: boolean;
}
