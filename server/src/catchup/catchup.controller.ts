import { Controller, Get, HttpCode, HttpStatus, Param, ParseUUIDPipe, Post } from '@nestjs/common';
import type { CatchupResultsDto, CatchupSummaryDto, CreateCatchupResponse } from '@covalent/shared-types';
import { CurrentUser } from '../common/decorators';
import { UserEntity } from '../users/entities/user.entity';
import { CatchupService } from './catchup.service';

const uuid = () => new ParseUUIDPipe();

/** The teacher's side: the debrief's readers (owner, class teacher or co-teacher, school admin); 404 for everyone else. */
@Controller('sessions/:id/catchups')
export class CatchupController {
  constructor(private readonly catchups: CatchupService) {}

  @Post()
  create(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string): Promise<CreateCatchupResponse> {
    return this.catchups.create(user, id);
  }

  @Get()
  list(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string): Promise<CatchupSummaryDto[]> {
    return this.catchups.list(user, id);
  }

  /** Stops the code from working; the results stay. */
  @Post(':catchupId/close')
  @HttpCode(HttpStatus.OK)
  close(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string, @Param('catchupId', uuid()) catchupId: string): Promise<CatchupSummaryDto> {
    return this.catchups.close(user, id, catchupId);
  }

  @Get(':catchupId/results')
  results(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string, @Param('catchupId', uuid()) catchupId: string): Promise<CatchupResultsDto> {
    return this.catchups.results(user, id, catchupId);
  }
}
