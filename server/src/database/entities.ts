import { AuthSessionEntity } from '../auth/entities/auth-session.entity';
import { OneTimeTokenEntity } from '../auth/entities/one-time-token.entity';
import { SchoolEntity } from '../users/entities/school.entity';
import { UserEntity } from '../users/entities/user.entity';

/** Every entity, for the app's TypeORM module and the migrations CLI alike. */
export const ENTITIES = [SchoolEntity, UserEntity, AuthSessionEntity, OneTimeTokenEntity];
