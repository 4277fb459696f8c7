import { ApiProperty } from '@nestjs/swagger';
import type { PhotoView } from '@shoalbook/shared';

export class PhotoViewDto implements PhotoView {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ example: 'image/jpeg' }) contentType: string;
  @ApiProperty({ description: 'px' }) width: number;
  @ApiProperty({ description: 'px' }) height: number;
  @ApiProperty({ description: 'bytes as stored (re-encoded)' }) byteSize: number;
}
