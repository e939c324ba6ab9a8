export { CatchupModule } from './catchup.module';
export { CatchupService } from './catchup.service';
export { CATCHUP_CLOCK, type CatchupClock } from './catchup.constants';
export { signCatchupToken, verifyCatchupToken, type CatchupTokenClaims } from './catchup-token';
export { catchupItemView } from './catchup-views';
export { CatchupEntity } from './entities/catchup.entity';
export { CatchupCardEntity } from './entities/catchup-card.entity';
export { CatchupAnswerEntity } from './entities/catchup-answer.entity';
export { closeEmptyCatchups } from './close-empty-catchups';
