import { ConfigType } from '@nestjs/config';
import { appConfig } from '../config/app.config';
import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { BanksModule } from '../banks/banks.module';
import { ClassesModule } from '../classes/classes.module';
import { MediaModule } from '../media/media.module';
import { SessionImagesService } from './session-images.service';
import { ResponseEntity } from './entities/response.entity';
import { SessionPlayerEntity } from './entities/session-player.entity';
import { SessionRoundEntity } from './entities/session-round.entity';
import { SessionTeamEntity } from './entities/session-team.entity';
import { SessionEntity } from './entities/session.entity';
import { HostGateway } from './gateways/host.gateway';
import { PlayerGateway } from './gateways/player.gateway';
import { JoinAttemptLimiter, JoinRateLimitGuard } from './join-rate-limit.guard';
import { JoinService } from './join.service';
import { LiveSessionsService } from './live/live-sessions.service';
import { SessionEmitter } from './live/session-emitter.service';
import { SessionStore } from './live/session-store.service';
import { PlayController } from './play.controller';
import { SessionsController } from './sessions.controller';
import { SessionsService } from './sessions.service';
import {
  DEFAULT_PLAY_RATE_LIMIT,
  DEFAULT_SESSION_TUNING,
  PLAY_RATE_LIMIT,
  SESSION_CLOCK,
  SESSION_TUNING,
} from './sessions.constants';

@Module({
  imports: [
    TypeOrmModule.forFeature([SessionEntity, SessionTeamEntity, SessionPlayerEntity, SessionRoundEntity, ResponseEntity]),
    BanksModule,
    ClassesModule,
    MediaModule,
  ],
  controllers: [SessionsController, PlayController],
  providers: [
    SessionsService,
    SessionImagesService,
    JoinService,
    LiveSessionsService,
    SessionStore,
    SessionEmitter,
    HostGateway,
    PlayerGateway,
    JoinAttemptLimiter,
    JoinRateLimitGuard,
    { provide: SESSION_CLOCK, useValue: { now: () => Date.now() } },
    { provide: SESSION_TUNING, useValue: DEFAULT_SESSION_TUNING },
    {
      provide: PLAY_RATE_LIMIT,
      inject: [appConfig.KEY],
      useFactory: (config: ConfigType<typeof appConfig>) => ({ ...DEFAULT_PLAY_RATE_LIMIT, requests: config.playJoinLimit }),
    },
  ],
  exports: [SessionsService, LiveSessionsService, SessionStore],
})
export class SessionsModule {}
