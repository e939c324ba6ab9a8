export { MediaModule } from './media.module';
export { MediaService, IMAGE_MAX_BYTES } from './media.service';
export { sniffImageType, IMAGE_MIMES, type ImageMime } from './image-sniff';
export { MEDIA_STORAGE, type MediaStorage } from './media-storage';
export { LocalDiskStorage } from './local-disk-storage';
export * from './csv-table';
export * from './uploads';
