import { Body, Controller, Get, Param, Post, Req, UseGuards } from '@nestjs/common';
import type { JoinInfoResponse, JoinResponse } from '@covalent/shared-types';
import type { Request } from 'express';
import { Public } from '../common/decorators';
import { JoinDto } from './dto/join.dto';
import { JoinRateLimitGuard } from './join-rate-limit.guard';
import { JoinService } from './join.service';

/** The student side of joining: no sign-in, rate-limited per address. */
@Public()
@UseGuards(JoinRateLimitGuard)
@Controller('play')
export class PlayController {
  constructor(private readonly joins: JoinService) {}

  @Get('sessions/:code')
  info(@Param('code') code: string, @Req() req: Request): Promise<JoinInfoResponse> {
    return this.joins.info(code, req.ip ?? 'unknown');
  }

  @Post('join')
  join(@Body() dto: JoinDto, @Req() req: Request): Promise<JoinResponse> {
    return this.joins.join(dto, req.ip ?? 'unknown');
  }
}
