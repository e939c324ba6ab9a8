import { Module } from '@nestjs/common';
import { ConfigModule, ConfigType } from '@nestjs/config';
import { TypeOrmModule } from '@nestjs/typeorm';
import { mediaConfig } from '../config/media.config';
import { MediaEntity } from './entities/media.entity';
import { LocalDiskStorage } from './local-disk-storage';
import { MediaController } from './media.controller';
import { MEDIA_STORAGE } from './media-storage';
import { MediaService } from './media.service';

@Module({
  imports: [ConfigModule.forFeature(mediaConfig), TypeOrmModule.forFeature([MediaEntity])],
  controllers: [MediaController],
  providers: [
    MediaService,
    { provide: MEDIA_STORAGE, inject: [mediaConfig.KEY], useFactory: (config: ConfigType<typeof mediaConfig>) => new LocalDiskStorage(config.dir) },
  ],
  exports: [MediaService],
})
export class MediaModule {}
