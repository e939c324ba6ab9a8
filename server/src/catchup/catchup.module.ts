import { Module } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import { TypeOrmModule } from '@nestjs/typeorm';
import { appConfig } from '../config/app.config';
import { DebriefModule } from '../debrief/debrief.module';
import { JoinAttemptLimiter, JoinRateLimitGuard } from '../sessions/join-rate-limit.guard';
import { DEFAULT_PLAY_RATE_LIMIT, PLAY_RATE_LIMIT } from '../sessions/sessions.constants';
import { CATCHUP_CLOCK } from './catchup.constants';
import { CatchupController } from './catchup.controller';
import { CatchupService } from './catchup.service';
import { CatchupAnswerEntity } from './entities/catchup-answer.entity';
import { CatchupCardEntity } from './entities/catchup-card.entity';
import { CatchupEntity } from './entities/catchup.entity';
import { PlayCatchupController } from './play-catchup.controller';

@Module({
  imports: [TypeOrmModule.forFeature([CatchupEntity, CatchupCardEntity, CatchupAnswerEntity]), DebriefModule],
  controllers: [CatchupController, PlayCatchupController],
  providers: [
    CatchupService,
    // Its own limiter: catch-up codes are guessed apart from session codes, with the same limits.
    JoinAttemptLimiter,
    JoinRateLimitGuard,
    { provide: CATCHUP_CLOCK, useValue: { now: () => Date.now() } },
    {
      provide: PLAY_RATE_LIMIT,
      inject: [appConfig.KEY],
      useFactory: (config: ConfigType<typeof appConfig>) => ({ ...DEFAULT_PLAY_RATE_LIMIT, requests: config.playJoinLimit }),
    },
  ],
  exports: [CatchupService],
})
export class CatchupModule {}
