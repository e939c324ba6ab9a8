import { registerAs } from '@nestjs/config';
import { validateEnv } from './env.validation';

export const appConfig = registerAs('app', () => {
  const env = validateEnv(process.env);
  return {
    env: env.NODE_ENV,
    host: env.HOST,
    port: env.PORT,
    publicUrl: env.PUBLIC_URL.replace(/\/$/, ''),
    secret: env.APP_SECRET,
    cookieSecure: env.COOKIE_SECURE === 'true',
    signInLimit: env.SIGNIN_LIMIT,
    signInWindowMs: env.SIGNIN_WINDOW_SECONDS * 1000,
    logLevel: env.LOG_LEVEL,
    playJoinLimit: env.PLAY_JOIN_LIMIT,
    benchMetrics: env.BENCH_METRICS === 'true',
    hostAppDist: env.HOST_APP_DIST,
    playerAppDist: env.PLAYER_APP_DIST,
  };
});
export type AppConfig = ReturnType<typeof appConfig>;
