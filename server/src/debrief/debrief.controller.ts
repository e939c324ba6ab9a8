import { Controller, Get, HttpCode, HttpStatus, Param, ParseUUIDPipe, Post, Res, StreamableFile } from '@nestjs/common';
import type { Response } from 'express';
import type { DebriefDto, DebriefEmailResponse, DebriefItemDto, DebriefSummaryDto } from '@covalent/shared-types';
import { CurrentUser } from '../common/decorators';
import { UserEntity } from '../users/entities/user.entity';
import { CsvExport, DebriefService } from './debrief.service';

const uuid = () => new ParseUUIDPipe();

function csvFile(res: Response, file: CsvExport): StreamableFile {
  res.setHeader('Cache-Control', 'no-store');
  return new StreamableFile(Buffer.from(file.csv, 'utf8'), { type: 'text/csv; charset=utf-8', disposition: `attachment; filename="${file.fileName}"` });
}

/** Debriefs and their exports: the session's owner, its class's teacher and co-teachers, its school's admins; 404 for everyone else. */
@Controller()
export class DebriefController {
  constructor(private readonly debriefs: DebriefService) {}

  @Get('debriefs')
  list(@CurrentUser() user: UserEntity): Promise<DebriefSummaryDto[]> {
    return this.debriefs.list(user);
  }

  @Get('sessions/:id/debrief')
  debrief(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string): Promise<DebriefDto> {
    return this.debriefs.debrief(user, id);
  }

  @Get('sessions/:id/debrief/items/:itemId')
  item(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string, @Param('itemId', uuid()) itemId: string): Promise<DebriefItemDto> {
    return this.debriefs.item(user, id, itemId);
  }

  @Post('sessions/:id/debrief/email')
  @HttpCode(HttpStatus.OK)
  email(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string): Promise<DebriefEmailResponse> {
    return this.debriefs.email(user, id);
  }

  @Get('sessions/:id/exports/gradebook.csv')
  async gradebook(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string, @Res({ passthrough: true }) res: Response): Promise<StreamableFile> {
    return csvFile(res, await this.debriefs.gradebook(user, id));
  }

  @Get('sessions/:id/exports/item-analysis.csv')
  async itemAnalysis(@CurrentUser() user: UserEntity, @Param('id', uuid()) id: string, @Res({ passthrough: true }) res: Response): Promise<StreamableFile> {
    return csvFile(res, await this.debriefs.itemAnalysis(user, id));
  }
}
