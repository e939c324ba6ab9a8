import { Controller, Get, Param, ParseUUIDPipe } from '@nestjs/common';
import type { ClassTrendDto, StudentHistoryDto } from '@covalent/shared-types';
import { CurrentUser } from '../common/decorators';
import { UserEntity } from '../users/entities/user.entity';
import { HistoryService } from './history.service';

const uuid = () => new ParseUUIDPipe();

/** A class over time: the class's owner, co-teachers and school admins; 404 for everyone else. */
@Controller('classes/:id')
export class HistoryController {
  constructor(private readonly history: HistoryService) {}

  @Get('trends')
  trends(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string): Promise<ClassTrendDto> {
    return this.history.trends(user, id);
  }

  @Get('roster/:entryId/history')
  student(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string, @Param('entryId', uuid()) entryId: string): Promise<StudentHistoryDto> {
    return this.history.student(user, id, entryId);
  }
}
