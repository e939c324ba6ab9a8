import { Controller, Get, HttpCode, HttpStatus, Param, ParseUUIDPipe, Post, Res, StreamableFile, UploadedFile } from '@nestjs/common';
import type { Response } from 'express';
import type { MediaDto } from '@covalent/shared-types';
import { CurrentUser } from '../common/decorators';
import { UserEntity } from '../users/entities/user.entity';
import { toMediaDto } from './media.mapper';
import { IMAGE_MAX_BYTES, MediaService } from './media.service';
import { requireFile, SingleFileUpload, type UploadedBuffer } from './uploads';

@Controller('media/images')
export class MediaController {
  constructor(private readonly media: MediaService) {}

  @Post()
  @HttpCode(HttpStatus.CREATED)
  @SingleFileUpload(IMAGE_MAX_BYTES, 'image')
  async upload(@CurrentUser() user: UserEntity, @UploadedFile() file: UploadedBuffer | undefined): Promise<MediaDto> {
    return toMediaDto(await this.media.saveImage(user, requireFile(file, 'image').buffer));
  }

  @Get(':id')
  async fetch(
    @CurrentUser() user: UserEntity,
    @Param('id', new ParseUUIDPipe()) id: string,
    @Res({ passthrough: true }) res: Response,
  ): Promise<StreamableFile> {
    const { media, bytes } = await this.media.imageFor(user, id);
    // The sniffed type only, no sniffing by the browser, and nothing active even if opened directly.
    res.setHeader('X-Content-Type-Options', 'nosniff');
    res.setHeader('Content-Security-Policy', "default-src 'none'");
    res.setHeader('Cache-Control', 'private, max-age=86400, immutable');
    return new StreamableFile(bytes, { type: media.mime, disposition: 'inline', length: bytes.length });
  }
}
