import { Module } from '@nestjs/common';
import { ClassesModule } from '../classes/classes.module';
import { SessionsModule } from '../sessions/sessions.module';
import { DebriefController } from './debrief.controller';
import { DebriefService } from './debrief.service';

@Module({
  imports: [SessionsModule, ClassesModule],
  controllers: [DebriefController],
  providers: [DebriefService],
  exports: [DebriefService],
})
export class DebriefModule {}
