export { RetentionModule } from './retention.module';
export { RetentionService, type RetentionReport } from './retention.service';
export { PlayerDataService } from './player-data.service';
export { RETENTION_CLOCK, RETENTION_EVERY_MS, DAY_MS, type RetentionClock } from './retention.constants';
export { scrubSnapshot } from './scrub-snapshot';
