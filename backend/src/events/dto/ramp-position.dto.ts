import { ApiProperty } from '@nestjs/swagger';
import type { RampPosition } from '@shoalbook/shared';
import { IsNumber, Max, Min } from 'class-validator';
import { FINITE } from '../../common/dto/finite-number';

/** The launch and check-in ramp: both coordinates or none (send null to clear it). */
export class RampPositionDto implements RampPosition {
  @ApiProperty({ minimum: -90, maximum: 90, description: 'WGS 84 decimal degrees' })
  @IsNumber(FINITE, { message: 'The ramp latitude must be a number of decimal degrees.' })
  @Min(-90, { message: 'The ramp latitude must be within -90 to 90.' })
  @Max(90, { message: 'The ramp latitude must be within -90 to 90.' })
  lat: number;
  @ApiProperty({ minimum: -180, maximum: 180, description: 'WGS 84 decimal degrees' })
  @IsNumber(FINITE, { message: 'The ramp longitude must be a number of decimal degrees.' })
  @Min(-180, { message: 'The ramp longitude must be within -180 to 180.' })
  @Max(180, { message: 'The ramp longitude must be within -180 to 180.' })
  lon: number;
}

export class RampPositionViewDto implements RampPosition {
  @ApiProperty() lat: number;
  @ApiProperty() lon: number;
}
