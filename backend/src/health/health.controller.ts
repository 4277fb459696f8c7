import { MikroORM } from '@mikro-orm/mariadb';
import { Controller, Get, HttpStatus, Req, Res } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiProperty, ApiServiceUnavailableResponse, ApiTags } from '@nestjs/swagger';
import type { Request, Response } from 'express';
import type { HealthResponse } from '@shoalbook/shared';
import { Public } from '../common/decorators/public.decorator';
import { DB_RETRY_AFTER_SECONDS } from '../common/filters/api-exception.filter';
import { JournalProjector } from '../projections/journal-projector.service';

/** How long the database may take to answer before we call it down. */
const DB_CHECK_TIMEOUT_MS = 1500;

export class HealthResponseDto implements HealthResponse {
  @ApiProperty({ enum: ['ok', 'error'] }) status: 'ok' | 'error';
  @ApiProperty({ enum: ['up', 'down'] }) db: 'up' | 'down';
}

class ProjectionLagDto {
  @ApiProperty({ description: 'journal events the read models have not applied yet' }) events: number;
  @ApiProperty({ description: 'catch-ups failed in a row (retried with a growing delay)' }) failedRuns: number;
}

export class HealthOkDto extends HealthResponseDto {
  @ApiProperty({ type: ProjectionLagDto, required: false }) projection?: ProjectionLagDto;
}

@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(
    private readonly orm: MikroORM,
    private readonly projector: JournalProjector,
  ) {}

  @Public()
  @Get()
  @ApiOperation({ summary: 'Liveness with a real database round trip' })
  @ApiOkResponse({ type: HealthOkDto })
  @ApiServiceUnavailableResponse({ type: HealthResponseDto, description: 'The database does not answer.' })
  async check(
    @Req() req: Request,
    @Res({ passthrough: true }) res: Response,
  ): Promise<HealthResponse | (HealthResponse & object)> {
    if (await this.databaseAnswers()) {
      if (!this.projector.enabled) return { status: 'ok', db: 'up' };
      return { status: 'ok', db: 'up', projection: await this.projector.lag() };
    }
    res.status(HttpStatus.SERVICE_UNAVAILABLE);
    res.setHeader('Retry-After', String(DB_RETRY_AFTER_SECONDS));
    // Also carries the ApiError fields, so clients that only know the error shape read it too.
    return {
      status: 'error',
      db: 'down',
      statusCode: 503,
      error: 'Service Unavailable',
      message: 'The database does not answer.',
      requestId: req.id,
    } as HealthResponse;
  }

  private async databaseAnswers(): Promise<boolean> {
    let timer: NodeJS.Timeout | undefined;
    const timeout = new Promise<false>((resolve) => (timer = setTimeout(() => resolve(false), DB_CHECK_TIMEOUT_MS)));
    try {
      const check = this.orm.em
        .getConnection()
        .execute('select 1 as ok')
        .then(() => true)
        .catch(() => false);
      return await Promise.race([check, timeout]);
    } finally {
      clearTimeout(timer);
    }
  }
}
