import { HttpStatus, Inject, Injectable } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import { InjectRepository } from '@nestjs/typeorm';
import * as argon2 from 'argon2';
import { IsNull, LessThan, Repository } from 'typeorm';
import { ApiException } from '../common/api-error';
import { appConfig } from '../config/app.config';
import { MailService } from '../mail/mail.service';
import { UserEntity } from '../users/entities/user.entity';
import { AUTH_CLOCK, Clock, INVITE_TTL_MS, RESET_TTL_MS, SESSION_TTL_MS } from './auth.constants';
import { AuthSessionEntity } from './entities/auth-session.entity';
import { OneTimePurpose, OneTimeTokenEntity } from './entities/one-time-token.entity';
import { normalisePassword, passwordProblems } from './password-policy';
import { hashSecret, newSecret } from './tokens';

const BAD_CREDENTIALS = 'That e-mail and password do not match an account.';

@Injectable()
export class AuthService {
  /** Verified against when the e-mail is unknown, so timing does not reveal which accounts exist. */
  private readonly dummyHash = argon2.hash('covalent-timing-equaliser');

  constructor(
    @InjectRepository(UserEntity) private readonly users: Repository<UserEntity>,
    @InjectRepository(AuthSessionEntity) private readonly sessions: Repository<AuthSessionEntity>,
    @InjectRepository(OneTimeTokenEntity) private readonly tokens: Repository<OneTimeTokenEntity>,
    @Inject(appConfig.KEY) private readonly config: ConfigType<typeof appConfig>,
    @Inject(AUTH_CLOCK) private readonly clock: Clock,
    private readonly mail: MailService,
  ) {}

  hashPassword(password: string): Promise<string> {
    return argon2.hash(normalisePassword(password), { type: argon2.argon2id });
  }

  /** Returns a new session token for the cookie, or throws 401 with one message for every failure. */
  async signIn(email: string, password: string): Promise<{ token: string; user: UserEntity }> {
    const user = await this.users.findOne({ where: { email }, relations: { school: true } });
    if (!user?.passwordHash) {
      await argon2.verify(await this.dummyHash, password).catch(() => false);
      throw new ApiException(HttpStatus.UNAUTHORIZED, 'invalid_credentials', BAD_CREDENTIALS);
    }
    const ok = await argon2.verify(user.passwordHash, normalisePassword(password)).catch(() => false);
    if (!ok) throw new ApiException(HttpStatus.UNAUTHORIZED, 'invalid_credentials', BAD_CREDENTIALS);
    if (!user.active) {
      throw new ApiException(HttpStatus.FORBIDDEN, 'account_deactivated', 'This account has been deactivated. Ask your school administrator.');
    }
    return { token: await this.createSession(user.id), user };
  }

  /** The user with this e-mail (trimmed and lower-cased, as stored), active or not; for school sign-on. */
  findUserByEmail(email: string): Promise<UserEntity | null> {
    return this.users.findOne({ where: { email: email.trim().toLowerCase() }, relations: { school: true } });
  }

  async createSession(userId: string): Promise<string> {
    const token = newSecret();
    await this.sessions.insert({ tokenHash: hashSecret(token), userId, expiresAt: new Date(this.clock.now() + SESSION_TTL_MS) });
    // Housekeeping: expired sessions of this user go as a new one is made.
    await this.sessions.delete({ userId, expiresAt: LessThan(new Date(this.clock.now())) });
    return token;
  }

  /** The active user behind a session cookie, or null. */
  async userForSession(token: string | undefined): Promise<UserEntity | null> {
    if (!token || token.length > 200) return null;
    const session = await this.sessions.findOne({ where: { tokenHash: hashSecret(token) }, relations: { user: { school: true } } });
    if (!session || session.expiresAt.getTime() <= this.clock.now() || !session.user?.active) return null;
    return session.user;
  }

  async signOut(token: string | undefined): Promise<void> {
    if (token) await this.sessions.delete({ tokenHash: hashSecret(token) });
  }

  async endAllSessions(userId: string): Promise<void> {
    await this.sessions.delete({ userId });
  }

  /** Always succeeds from the caller's view, so it cannot be used to find accounts. */
  async requestPasswordReset(email: string): Promise<void> {
    const user = await this.users.findOne({ where: { email, active: true } });
    if (!user?.passwordHash) return;
    const token = await this.issueToken(user.id, 'reset', RESET_TTL_MS);
    const link = `${this.config.publicUrl}/reset-password?token=${encodeURIComponent(token)}`;
    await this.mail.send({
      to: user.email,
      subject: 'Reset your Covalent password',
      text: [
        `Hello ${user.displayName},`,
        '',
        'Someone (we hope you) asked to reset your Covalent password. Open this link within one hour to choose a new one:',
        link,
        '',
        'The link works once. If you did not ask for this, ignore this e-mail; your password stays as it is.',
      ].join('\n'),
    });
  }

  async issueToken(userId: string, purpose: OneTimePurpose, ttlMs: number): Promise<string> {
    const token = newSecret();
    // A new link of the same kind replaces older unused ones.
    await this.tokens.delete({ userId, purpose, usedAt: IsNull() });
    await this.tokens.insert({ tokenHash: hashSecret(token), purpose, userId, expiresAt: new Date(this.clock.now() + ttlMs) });
    return token;
  }

  async issueInvitation(userId: string): Promise<string> {
    return this.issueToken(userId, 'invite', INVITE_TTL_MS);
  }

  /** Sets the password behind a reset or invitation link; the link is spent atomically. */
  async setPasswordWithToken(token: string, password: string, purpose: OneTimePurpose, displayName?: string): Promise<UserEntity> {
    const row = await this.tokens.findOne({ where: { tokenHash: hashSecret(token), purpose }, relations: { user: true } });
    if (!row || !row.user) throw new ApiException(HttpStatus.BAD_REQUEST, 'link_invalid', 'This link is not valid. Ask for a new one.');
    if (row.usedAt) throw new ApiException(HttpStatus.GONE, 'link_used', 'This link has already been used. Ask for a new one.');
    if (row.expiresAt.getTime() <= this.clock.now()) {
      throw new ApiException(HttpStatus.GONE, 'link_expired', 'This link has expired. Ask for a new one.');
    }
    if (!row.user.active) throw new ApiException(HttpStatus.FORBIDDEN, 'account_deactivated', 'This account has been deactivated.');
    const problems = passwordProblems(password, { email: row.user.email, displayName: displayName ?? row.user.displayName });
    if (problems.length) {
      throw new ApiException(HttpStatus.BAD_REQUEST, 'weak_password', problems[0], problems.map((message) => ({ field: 'password', message })));
    }
    const passwordHash = await this.hashPassword(password);
    await this.tokens.manager.transaction(async (tx) => {
      const spent = await tx
        .createQueryBuilder()
        .update(OneTimeTokenEntity)
        .set({ usedAt: new Date(this.clock.now()) })
        .where('id = :id AND used_at IS NULL', { id: row.id })
        .execute();
      if (spent.affected !== 1) throw new ApiException(HttpStatus.GONE, 'link_used', 'This link has already been used. Ask for a new one.');
      await tx.update(UserEntity, { id: row.userId }, { passwordHash, ...(displayName ? { displayName } : {}) });
      await tx.delete(AuthSessionEntity, { userId: row.userId });
    });
    return (await this.users.findOne({ where: { id: row.userId }, relations: { school: true } }))!;
  }
}
