import { Body, Controller, Get, Param, ParseUUIDPipe, Post } from '@nestjs/common';
import type { SessionDto } from '@covalent/shared-types';
import { CurrentUser } from '../common/decorators';
import { UserEntity } from '../users/entities/user.entity';
import { CreateSessionDto } from './dto/create-session.dto';
import { SessionsService } from './sessions.service';

@Controller('sessions')
export class SessionsController {
  constructor(private readonly sessions: SessionsService) {}

  @Post()
  create(@CurrentUser() user: UserEntity, @Body() dto: CreateSessionDto): Promise<SessionDto> {
    return this.sessions.create(user, dto);
  }

  @Get()
  list(@CurrentUser() user: UserEntity): Promise<SessionDto[]> {
    return this.sessions.list(user);
  }

  @Get(':id')
  detail(@CurrentUser() user: UserEntity, @Param('id', new ParseUUIDPipe()) id: string): Promise<SessionDto> {
    return this.sessions.detail(user, id);
  }
}
