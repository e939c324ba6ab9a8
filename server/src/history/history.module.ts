import { Module } from '@nestjs/common';
import { CatchupModule } from '../catchup/catchup.module';
import { ClassesModule } from '../classes/classes.module';
import { DebriefModule } from '../debrief/debrief.module';
import { HistoryController } from './history.controller';
import { HistoryService } from './history.service';

@Module({
  imports: [ClassesModule, DebriefModule, CatchupModule],
  controllers: [HistoryController],
  providers: [HistoryService],
})
export class HistoryModule {}
