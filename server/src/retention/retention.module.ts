import { Module } from '@nestjs/common';
import { ClassesModule } from '../classes/classes.module';
import { SessionsModule } from '../sessions/sessions.module';
import { PlayerDataController } from './player-data.controller';
import { PlayerDataService } from './player-data.service';
import { RETENTION_CLOCK } from './retention.constants';
import { RetentionService } from './retention.service';

@Module({
  imports: [SessionsModule, ClassesModule],
  controllers: [PlayerDataController],
  providers: [PlayerDataService, RetentionService, { provide: RETENTION_CLOCK, useValue: { now: () => Date.now() } }],
  exports: [PlayerDataService, RetentionService],
})
export class RetentionModule {}
