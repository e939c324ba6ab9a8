export { HistoryModule } from './history.module';
export { HistoryService } from './history.service';
export { meanOfFigures } from './domain';
