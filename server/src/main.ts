import 'reflect-metadata';
import { Logger, LogLevel } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import { NestExpressApplication } from '@nestjs/platform-express';
import { AppModule } from './app.module';
import { configureApp } from './app.setup';
import { validateEnv } from './config/env.validation';

const LEVELS: Record<string, LogLevel[]> = {
  silent: [],
  error: ['error', 'fatal'],
  warn: ['error', 'fatal', 'warn'],
  log: ['error', 'fatal', 'warn', 'log'],
  debug: ['error', 'fatal', 'warn', 'log', 'debug'],
};

async function bootstrap(): Promise<void> {
  let env;
  try {
    env = validateEnv(process.env);
  } catch (err) {
    console.error((err as Error).message);
    process.exit(1);
  }
  const app = await NestFactory.create<NestExpressApplication>(AppModule, { bodyParser: false, logger: LEVELS[env.LOG_LEVEL] });
  configureApp(app, { logRequests: env.LOG_LEVEL !== 'silent', hostAppDist: env.HOST_APP_DIST, playerAppDist: env.PLAYER_APP_DIST });
  app.enableShutdownHooks();
  await app.listen(env.PORT, env.HOST);
  Logger.log(`listening on http://${env.HOST}:${env.PORT}`, 'Covalent');
}

void bootstrap();
