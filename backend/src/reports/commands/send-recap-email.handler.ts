import { EntityManager } from '@mikro-orm/mariadb';
import { HttpStatus, Logger } from '@nestjs/common';
import { CommandHandler, type ICommandHandler, QueryBus } from '@nestjs/cqrs';
import type { RecapEmailResult } from '@shoalbook/shared';
import { ApiException, ErrorCode, fieldError } from '../../common/errors/api-errors';
import { AppConfig } from '../../config/app-config.service';
import { Membership } from '../../crews/membership.entity';
import { MailService } from '../../mail/mail.service';
import { User } from '../../users/user.entity';
import { GetEventRecapQuery } from '../queries/event-recap.query';
import { recapMail } from '../recap-mail.template';
import { SendRecapEmailCommand } from './send-recap-email.command';

/** Looks the recipients up among the crew's members only (scoped in the query) and mails each the recap. */
@CommandHandler(SendRecapEmailCommand)
export class SendRecapEmailHandler implements ICommandHandler<SendRecapEmailCommand, RecapEmailResult> {
  private readonly logger = new Logger(SendRecapEmailHandler.name);

  constructor(
    private readonly em: EntityManager,
    private readonly queries: QueryBus,
    private readonly mail: MailService,
    private readonly config: AppConfig,
  ) {}

  async execute({ access, eventId, userIds }: SendRecapEmailCommand): Promise<RecapEmailResult> {
    const wanted = [...new Set(userIds)];
    if (!wanted.length) throw fieldError('userIds', 'Choose at least one crew member to send the recap to.');
    const recap = await this.queries.execute(new GetEventRecapQuery(access.crewId, eventId));
    if (!recap) throw new ApiException(HttpStatus.NOT_FOUND, 'No such event in this crew.', ErrorCode.notFound);
    const members = await this.em.find(
      Membership,
      { crew: access.crewId, user: { $in: wanted } },
      { populate: ['user'] },
    );
    if (members.length !== wanted.length) throw fieldError('userIds', 'The recap goes only to members of this crew.');
    const sender = await this.em.findOne(User, { id: access.userId });
    const link = `${this.config.appUrl}/crews/${access.crewId}/reports/events/${eventId}`;
    const message = recapMail({
      crewName: access.crew.name,
      senderName: sender?.displayName ?? 'A crew member',
      recap,
      link,
    });
    let sent = 0;
    for (const m of members) {
      try {
        await this.mail.send(m.user.email, message);
        sent++;
      } catch (e) {
        this.logger.error(`recap to a member failed: ${e instanceof Error ? e.message : String(e)}`);
      }
    }
    if (sent === 0)
      throw new ApiException(
        HttpStatus.BAD_GATEWAY,
        'The recap could not be sent; try again later.',
        ErrorCode.mailFailed,
      );
    return { sent };
  }
}
