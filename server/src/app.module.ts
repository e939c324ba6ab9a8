import { Module } from '@nestjs/common';
import { ConfigModule, ConfigType } from '@nestjs/config';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AuthModule } from './auth/auth.module';
import { BanksModule } from './banks/banks.module';
import { CatchupModule } from './catchup/catchup.module';
import { ClassesModule } from './classes/classes.module';
import { DebriefModule } from './debrief/debrief.module';
import { appConfig } from './config/app.config';
import { databaseConfig } from './config/database.config';
import { mailConfig } from './config/mail.config';
import { validateEnv } from './config/env.validation';
import { dataSourceOptions } from './database/data-source';
import { HistoryModule } from './history/history.module';
import { HealthModule } from './health/health.module';
import { MailModule } from './mail/mail.module';
import { MediaModule } from './media/media.module';
import { RetentionModule } from './retention/retention.module';
import { SessionsModule } from './sessions/sessions.module';
import { UsersModule } from './users/users.module';

@Module({
  imports: [
    ConfigModule.forRoot({ isGlobal: true, ignoreEnvFile: true, load: [appConfig, databaseConfig, mailConfig], validate: validateEnv }),
    TypeOrmModule.forRootAsync({
      inject: [databaseConfig.KEY],
      useFactory: (db: ConfigType<typeof databaseConfig>) => dataSourceOptions(db.url, db.poolSize),
    }),
    MailModule,
    AuthModule,
    UsersModule,
    HealthModule,
    MediaModule,
    BanksModule,
    ClassesModule,
    SessionsModule,
    DebriefModule,
    CatchupModule,
    HistoryModule,
    RetentionModule,
  ],
})
export class AppModule {}
