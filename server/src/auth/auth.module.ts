import { Global, Module } from '@nestjs/common';
import { ConfigModule, ConfigType } from '@nestjs/config';
import { APP_GUARD } from '@nestjs/core';
import { ThrottlerModule } from '@nestjs/throttler';
import { TypeOrmModule } from '@nestjs/typeorm';
import { appConfig } from '../config/app.config';
import { oidcConfig } from '../config/oidc.config';
import { UserEntity } from '../users/entities/user.entity';
import { AUTH_CLOCK } from './auth.constants';
import { AuthController } from './auth.controller';
import { AuthGuard } from './auth.guard';
import { AuthService } from './auth.service';
import { AuthSessionEntity } from './entities/auth-session.entity';
import { OneTimeTokenEntity } from './entities/one-time-token.entity';
import { SignOnController } from './oidc/sign-on.controller';
import { SignOnService } from './oidc/sign-on.service';
import { SignInThrottlerGuard } from './sign-in-throttler.guard';

@Global()
@Module({
  imports: [
    ConfigModule.forFeature(oidcConfig),
    TypeOrmModule.forFeature([UserEntity, AuthSessionEntity, OneTimeTokenEntity]),
    ThrottlerModule.forRootAsync({
      inject: [appConfig.KEY],
      useFactory: (config: ConfigType<typeof appConfig>) => ({
        throttlers: [{ name: 'signin', limit: config.signInLimit, ttl: config.signInWindowMs }],
      }),
    }),
  ],
  controllers: [AuthController, SignOnController],
  providers: [
    AuthService,
    SignOnService,
    SignInThrottlerGuard,
    { provide: AUTH_CLOCK, useValue: { now: () => Date.now() } },
    { provide: APP_GUARD, useClass: AuthGuard },
  ],
  exports: [AuthService],
})
export class AuthModule {}
