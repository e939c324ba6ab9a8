import { HttpStatus, Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Repository } from 'typeorm';
import { ApiException } from '../common/api-error';
import { SessionEntity } from './entities/session.entity';

@Injectable()
export class SessionImagesService {
  constructor(@InjectRepository(SessionEntity) private readonly sessions: Repository<SessionEntity>) {}

  /** 404 unless the session exists and one of its items shows this image. */
  async requireUsed(sessionId: string, imageId: string): Promise<void> {
    const session = await this.sessions.findOne({ where: { id: sessionId } });
    if (!session?.items.some((i) => i.imageId === imageId)) {
      throw new ApiException(HttpStatus.NOT_FOUND, 'not_found', 'No such picture in this session.');
    }
  }
}
