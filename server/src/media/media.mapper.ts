import type { MediaDto } from '@covalent/shared-types';
import { MediaEntity } from './entities/media.entity';

export const imageUrl = (id: string): string => `/api/media/images/${id}`;
/** What players load: scoped to the live session, whose items must use the image. */
export const sessionImageUrl = (sessionId: string, id: string): string => `/api/play/sessions/${sessionId}/images/${id}`;

export function toMediaDto(media: MediaEntity): MediaDto {
  return { id: media.id, mime: media.mime, byteSize: media.byteSize, sha256: media.sha256, url: imageUrl(media.id) };
}
