import { Body, Controller, Get, Param, ParseUUIDPipe, Post, Req, Res, StreamableFile, UseGuards } from '@nestjs/common';
import type { Response } from 'express';
import { MediaService } from '../media/media.service';
import { SessionImagesService } from './session-images.service';
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
  constructor(
    private readonly joins: JoinService,
    private readonly images: SessionImagesService,
    private readonly media: MediaService,
  ) {}

  /**
   * An item's picture for players: the session id and image id (both random UUIDs) are the
   * capability, and the image must belong to one of that session's items.
   */
  @Get('sessions/:sessionId/images/:imageId')
  async image(
    @Param('sessionId', new ParseUUIDPipe()) sessionId: string,
    @Param('imageId', new ParseUUIDPipe()) imageId: string,
    @Res({ passthrough: true }) res: Response,
  ): Promise<StreamableFile> {
    await this.images.requireUsed(sessionId, imageId);
    const { media, bytes } = await this.media.imageById(imageId);
    res.setHeader('X-Content-Type-Options', 'nosniff');
    res.setHeader('Content-Security-Policy', "default-src 'none'");
    res.setHeader('Cache-Control', 'private, max-age=3600');
    return new StreamableFile(bytes, { type: media.mime, disposition: 'inline', length: bytes.length });
  }

  @Get('sessions/:code')
  info(@Param('code') code: string, @Req() req: Request): Promise<JoinInfoResponse> {
    return this.joins.info(code, req.ip ?? 'unknown');
  }

  @Post('join')
  join(@Body() dto: JoinDto, @Req() req: Request): Promise<JoinResponse> {
    return this.joins.join(dto, req.ip ?? 'unknown');
  }
}
