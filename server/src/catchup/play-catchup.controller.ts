import { Body, Controller, Get, HttpCode, HttpStatus, Param, Post, Req, UseGuards } from '@nestjs/common';
import type { CatchupAnswerResponse, CatchupInfoResponse, CatchupStartResponse } from '@covalent/shared-types';
import type { Request } from 'express';
import { Public } from '../common/decorators';
import { JoinRateLimitGuard } from '../sessions/join-rate-limit.guard';
import { CatchupService } from './catchup.service';
import { CatchupAnswerDto } from './dto/catchup-answer.dto';
import { StartCatchupDto } from './dto/start-catchup.dto';

/** The student's side: no sign-in, rate-limited per address like joining a session. */
@Public()
@UseGuards(JoinRateLimitGuard)
@Controller('play/catchups')
export class PlayCatchupController {
  constructor(private readonly catchups: CatchupService) {}

  @Get(':code')
  info(@Param('code') code: string, @Req() req: Request): Promise<CatchupInfoResponse> {
    return this.catchups.info(code, req.ip ?? 'unknown');
  }

  @Post(':code/start')
  @HttpCode(HttpStatus.OK)
  start(@Param('code') code: string, @Body() dto: StartCatchupDto, @Req() req: Request): Promise<CatchupStartResponse> {
    return this.catchups.start(code, dto.rosterEntryId, req.ip ?? 'unknown');
  }

  @Post('answers')
  @HttpCode(HttpStatus.OK)
  answer(@Body() dto: CatchupAnswerDto, @Req() req: Request): Promise<CatchupAnswerResponse> {
    return this.catchups.answer(dto, req.ip ?? 'unknown');
  }
}
