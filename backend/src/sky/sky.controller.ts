import { Controller, Get, Query } from '@nestjs/common';
import { ApiCookieAuth, ApiOkResponse, ApiOperation, ApiProperty, ApiTags } from '@nestjs/swagger';
import { type SkyDayView, isCalendarDate } from '@shoalbook/shared';
import { IsUUID, Matches } from 'class-validator';
import { CrewRoute, CurrentCrew } from '../crews/access/crew.decorators';
import type { CrewAccess } from '../crews/access/request-context';
import { fieldErrors } from '../journal/journal-errors';
import { LakesService } from '../lakes/lakes.service';
import { SkyDayViewDto } from './dto/sky-view.dto';
import { SkyService } from './sky.service';

export class SkyQueryDto {
  @ApiProperty({ format: 'uuid' }) @IsUUID() lakeId: string;
  @ApiProperty({ example: '2024-04-12' })
  @Matches(/^\d{4}-\d{2}-\d{2}$/, { message: 'Write the date as YYYY-MM-DD.' })
  date: string;
}

@ApiTags('sky')
@ApiCookieAuth()
@CrewRoute()
@Controller('crews/:crewId/sky')
export class SkyController {
  constructor(
    private readonly lakes: LakesService,
    private readonly sky: SkyService,
  ) {}

  @Get()
  @ApiOperation({ summary: "Sun, moon and solunar periods of a lake's local day" })
  @ApiOkResponse({ type: SkyDayViewDto })
  async day(@CurrentCrew() access: CrewAccess, @Query() query: SkyQueryDto): Promise<SkyDayView> {
    if (!isCalendarDate(query.date)) throw fieldErrors({ date: ['No such calendar date.'] });
    const lake = await this.lakes.get(access.crewId, query.lakeId);
    return this.sky.dayView(lake, query.date);
  }
}
