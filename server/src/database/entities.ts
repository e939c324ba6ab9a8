import { AuthSessionEntity } from '../auth/entities/auth-session.entity';
import { OneTimeTokenEntity } from '../auth/entities/one-time-token.entity';
import { BankShareEntity } from '../banks/entities/bank-share.entity';
import { BankEntity } from '../banks/entities/bank.entity';
import { ItemEntity } from '../banks/entities/item.entity';
import { ClassCoTeacherEntity } from '../classes/entities/class-co-teacher.entity';
import { ClassEntity } from '../classes/entities/class.entity';
import { PairRuleEntity } from '../classes/entities/pair-rule.entity';
import { RosterEntryEntity } from '../classes/entities/roster-entry.entity';
import { MediaEntity } from '../media/entities/media.entity';
import { SchoolEntity } from '../users/entities/school.entity';
import { UserEntity } from '../users/entities/user.entity';
import { ResponseEntity } from '../sessions/entities/response.entity';
import { SessionPlayerEntity } from '../sessions/entities/session-player.entity';
import { SessionRoundEntity } from '../sessions/entities/session-round.entity';
import { SessionTeamEntity } from '../sessions/entities/session-team.entity';
import { SessionEntity } from '../sessions/entities/session.entity';
import { CatchupEntity } from '../catchup/entities/catchup.entity';
import { CatchupCardEntity } from '../catchup/entities/catchup-card.entity';
import { CatchupAnswerEntity } from '../catchup/entities/catchup-answer.entity';

/** Every entity, for the app's TypeORM module and the migrations CLI alike. */
export const ENTITIES = [
  SchoolEntity,
  UserEntity,
  AuthSessionEntity,
  OneTimeTokenEntity,
  MediaEntity,
  BankEntity,
  BankShareEntity,
  ItemEntity,
  ClassEntity,
  ClassCoTeacherEntity,
  RosterEntryEntity,
  PairRuleEntity,
  SessionEntity,
  SessionTeamEntity,
  SessionPlayerEntity,
  SessionRoundEntity,
  ResponseEntity,
  CatchupEntity,
  CatchupCardEntity,
  CatchupAnswerEntity,
];

