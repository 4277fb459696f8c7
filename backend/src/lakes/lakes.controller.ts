import { Body, Controller, Delete, Get, HttpCode, Param, Patch, Post } from '@nestjs/common';
import { CommandBus } from '@nestjs/cqrs';
import {
  ApiConflictResponse,
  ApiCookieAuth,
  ApiCreatedResponse,
  ApiNoContentResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
} from '@nestjs/swagger';
import type { LakeView } from '@shoalbook/shared';
import { CrewRoute, CurrentCrew } from '../crews/access/crew.decorators';
import { ApiErrorDto } from '../common/dto/api-error.dto';
import type { CrewAccess } from '../crews/access/request-context';
import { RecordIdPipe } from '../journal/record-id.pipe';
import { CreateLakeCommand, DeleteLakeCommand, UpdateLakeCommand } from './commands/lake.commands';
import { CreateLakeDto, LakeViewDto, UpdateLakeDto } from './dto/lake.dto';
import { lakeView } from './lake-view';
import { LakesService } from './lakes.service';

@ApiTags('lakes')
@ApiCookieAuth()
@CrewRoute()
@Controller('crews/:crewId/lakes')
export class LakesController {
  constructor(
    private readonly commands: CommandBus,
    private readonly lakes: LakesService,
  ) {}

  @Get()
  @ApiOperation({ summary: "The crew's lakes" })
  @ApiOkResponse({ type: [LakeViewDto] })
  async list(@CurrentCrew() access: CrewAccess): Promise<LakeView[]> {
    return (await this.lakes.list(access.crewId)).map(lakeView);
  }

  @Post()
  @ApiOperation({ summary: 'Add a lake (owner or angler)' })
  @ApiCreatedResponse({ type: LakeViewDto })
  create(@CurrentCrew() access: CrewAccess, @Body() dto: CreateLakeDto): Promise<LakeView> {
    return this.commands.execute(new CreateLakeCommand(access, dto));
  }

  @Get(':lakeId')
  @ApiOkResponse({ type: LakeViewDto })
  async get(
    @CurrentCrew() access: CrewAccess,
    @Param('lakeId', new RecordIdPipe('lake')) lakeId: string,
  ): Promise<LakeView> {
    return lakeView(await this.lakes.get(access.crewId, lakeId));
  }

  @Patch(':lakeId')
  @ApiOperation({ summary: 'Change a lake; send the version you loaded' })
  @ApiOkResponse({ type: LakeViewDto })
  @ApiConflictResponse({ type: ApiErrorDto, description: 'stale_version' })
  update(
    @CurrentCrew() access: CrewAccess,
    @Param('lakeId', new RecordIdPipe('lake')) lakeId: string,
    @Body() dto: UpdateLakeDto,
  ): Promise<LakeView> {
    return this.commands.execute(new UpdateLakeCommand(access, lakeId, dto));
  }

  @Delete(':lakeId')
  @HttpCode(204)
  @ApiOperation({ summary: 'Delete a lake without events or finds' })
  @ApiNoContentResponse()
  @ApiConflictResponse({ type: ApiErrorDto, description: 'in_use: the lake still has events or finds' })
  async remove(
    @CurrentCrew() access: CrewAccess,
    @Param('lakeId', new RecordIdPipe('lake')) lakeId: string,
  ): Promise<void> {
    await this.commands.execute(new DeleteLakeCommand(access, lakeId));
  }
}
