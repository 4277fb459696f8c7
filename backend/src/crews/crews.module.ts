import { Module } from '@nestjs/common';
import { CREW_COMMAND_HANDLERS } from './commands';
import { CrewController, CrewsController } from './crews.controller';
import { CrewsService } from './crews.service';
import { CrewInvitesController, InvitesController } from './invites.controller';
import { MembersController } from './members.controller';

@Module({
  controllers: [CrewsController, CrewController, MembersController, CrewInvitesController, InvitesController],
  providers: [CrewsService, ...CREW_COMMAND_HANDLERS],
})
export class CrewsModule {}
