import { Module } from '@nestjs/common';
import { SessionsModule } from '../sessions/sessions.module';
import { DebriefController } from './debrief.controller';
import { DebriefService } from './debrief.service';

@Module({
  imports: [SessionsModule],
  controllers: [DebriefController],
  providers: [DebriefService],
  exports: [DebriefService],
})
export class DebriefModule {}
