import { Controller, HttpCode, Post } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import type { ProjectionRebuildResult } from '@shoalbook/shared';
import { SiteAdminOnly } from '../common/guards/site-admin.guard';
import { ProjectionRebuildResultDto } from './dto/projection-rebuild-result.dto';
import { ProjectionRebuildService } from './rebuild.service';

@ApiTags('admin')
@Controller('admin/projections')
@SiteAdminOnly()
export class AdminProjectionsController {
  constructor(private readonly rebuilds: ProjectionRebuildService) {}

  @Post('rebuild')
  @HttpCode(200)
  @ApiOperation({ summary: 'Rebuild every read model from the journal (site admins).' })
  @ApiOkResponse({ type: ProjectionRebuildResultDto })
  async rebuild(): Promise<ProjectionRebuildResult> {
    const { events, durationMs } = await this.rebuilds.rebuild();
    return { events, durationMs };
  }
}
