import { Controller, Get, HttpStatus } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { ApiException } from '../common/api-error';
import { Public } from '../common/decorators';

@Controller('health')
export class HealthController {
  constructor(private readonly db: DataSource) {}

  /** Up only when PostgreSQL answers. */
  @Public()
  @Get()
  async check(): Promise<{ ok: true; database: 'up' }> {
    try {
      await this.db.query('SELECT 1');
    } catch {
      throw new ApiException(HttpStatus.SERVICE_UNAVAILABLE, 'database_down', 'The database is not answering.');
    }
    return { ok: true, database: 'up' };
  }
}
