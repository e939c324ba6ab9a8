import { Controller, Delete, Param, ParseUUIDPipe } from '@nestjs/common';
import type { DeletePlayerDataResponse } from '@covalent/shared-types';
import { CurrentUser } from '../common/decorators';
import { UserEntity } from '../users/entities/user.entity';
import { PlayerDataService } from './player-data.service';

const uuid = () => new ParseUUIDPipe();

/** A teacher deletes one student's data on request (DESIGN.md §9: deletion is real). */
@Controller()
export class PlayerDataController {
  constructor(private readonly playerData: PlayerDataService) {}

  @Delete('sessions/:id/players/:playerId/data')
  fromSession(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string, @Param('playerId', uuid()) playerId: string): Promise<DeletePlayerDataResponse> {
    return this.playerData.deleteFromSession(user, id, playerId);
  }

  @Delete('classes/:classId/roster/:entryId/data')
  forRosterEntry(@CurrentUser() user: UserEntity, @Param('classId', uuid()) classId: string, @Param('entryId', uuid()) entryId: string): Promise<DeletePlayerDataResponse> {
    return this.playerData.deleteForRosterEntry(user, classId, entryId);
  }
}
