import { Module } from '@nestjs/common';
import { ProjectionsModule } from '../projections/projections.module';
import { StorageModule } from '../storage/storage.module';
import { AuthModule } from '../auth/auth.module';
import { AccountDeletionController } from './account-deletion.controller';
import { AccountDeletionService } from './account-deletion.service';
import { CREW_COMMAND_HANDLERS } from './commands';
import { CrewController, CrewsController } from './crews.controller';
import { CrewRemovalService } from './crew-removal.service';
import { CrewsService } from './crews.service';
import { CrewInvitesController, InvitesController } from './invites.controller';
import { MembersController } from './members.controller';

@Module({
  imports: [AuthModule, StorageModule, ProjectionsModule],
  controllers: [
    AccountDeletionController,
    CrewsController,
    CrewController,
    MembersController,
    CrewInvitesController,
    InvitesController,
  ],
  providers: [AccountDeletionService, CrewsService, CrewRemovalService, ...CREW_COMMAND_HANDLERS],
  exports: [CrewRemovalService],
})
export class CrewsModule {}
