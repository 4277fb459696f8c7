import { readdir, readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { Controller, Get } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiProperty, ApiTags } from '@nestjs/swagger';
import type { OutboxMessage } from '@shoalbook/shared';
import { SiteAdminOnly } from '../common/guards/site-admin.guard';
import { AppConfig } from '../config/app-config.service';

export class OutboxMessageDto implements OutboxMessage {
  @ApiProperty() id: string;
  @ApiProperty({ format: 'date-time' }) receivedAt: string;
  @ApiProperty() from: string;
  @ApiProperty() to: string;
  @ApiProperty() subject: string;
  @ApiProperty() text: string;
  @ApiProperty() html: string;
}

/**
 * Development only: the messages the local fake SMTP server received. They carry password-reset and invite
 * links, so only a signed-in site admin reads them (OWASP ASVS 4.0.3 4.1.1 / 14.3.2: no secrets or debug
 * features open to anyone); mounted in the development profile alone.
 */
@ApiTags('dev')
@SiteAdminOnly()
@Controller('dev/outbox')
export class DevOutboxController {
  constructor(private readonly config: AppConfig) {}

  @Get()
  @ApiOperation({
    summary: 'E-mails caught by the local fake SMTP server, newest first (development only; site admins)',
  })
  @ApiOkResponse({ type: [OutboxMessageDto] })
  async list(): Promise<OutboxMessage[]> {
    const dir = this.config.get('MAIL_OUTBOX_DIR');
    let names: string[];
    try {
      names = (await readdir(dir)).filter((n) => n.endsWith('.json'));
    } catch {
      return [];
    }
    const messages: OutboxMessage[] = [];
    for (const name of names) {
      try {
        const m = JSON.parse(await readFile(join(dir, name), 'utf8')) as OutboxMessage;
        messages.push({
          id: m.id,
          receivedAt: m.receivedAt,
          from: m.from,
          to: m.to,
          subject: m.subject,
          text: m.text,
          html: m.html,
        });
      } catch {
        // A file still being written is skipped; the next poll shows it.
      }
    }
    return messages.sort((a, b) => b.receivedAt.localeCompare(a.receivedAt) || b.id.localeCompare(a.id));
  }
}
