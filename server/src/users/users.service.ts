import { HttpStatus, Inject, Injectable } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import { InjectRepository } from '@nestjs/typeorm';
import { Repository } from 'typeorm';
import { AuthService } from '../auth/auth.service';
import { ApiException } from '../common/api-error';
import { appConfig } from '../config/app.config';
import { MailService } from '../mail/mail.service';
import { InviteTeacherDto } from './dto/invite-teacher.dto';
import { UserEntity } from './entities/user.entity';

@Injectable()
export class UsersService {
  constructor(
    @InjectRepository(UserEntity) private readonly users: Repository<UserEntity>,
    private readonly auth: AuthService,
    private readonly mail: MailService,
    @Inject(appConfig.KEY) private readonly config: ConfigType<typeof appConfig>,
  ) {}

  listStaff(admin: UserEntity): Promise<UserEntity[]> {
    return this.users.find({ where: { schoolId: admin.schoolId }, order: { displayName: 'ASC' } });
  }

  /** Creates the teacher (no password yet) and e-mails a single-use link to set one. */
  async invite(admin: UserEntity, dto: InviteTeacherDto): Promise<UserEntity> {
    const existing = await this.users.findOne({ where: { email: dto.email } });
    if (existing && (existing.schoolId !== admin.schoolId || existing.passwordHash !== null)) {
      throw new ApiException(HttpStatus.CONFLICT, 'email_taken', 'That e-mail address already has an account.');
    }
    const user =
      existing ?? (await this.users.save(this.users.create({ ...dto, role: 'teacher', schoolId: admin.schoolId, passwordHash: null, active: true })));
    const token = await this.auth.issueInvitation(user.id);
    const link = `${this.config.publicUrl}/accept-invite?token=${encodeURIComponent(token)}`;
    await this.mail.send({
      to: user.email,
      subject: `${admin.displayName} invited you to Covalent`,
      text: [
        `Hello ${user.displayName},`,
        '',
        `${admin.displayName} has invited you to Covalent, the team-review game your school uses.`,
        'Open this link within seven days to choose your password:',
        link,
        '',
        'The link works once.',
      ].join('\n'),
    });
    return user;
  }

  async setActive(admin: UserEntity, userId: string, active: boolean): Promise<UserEntity> {
    const user = await this.users.findOne({ where: { id: userId, schoolId: admin.schoolId } });
    // Another school's staff look exactly like nobody at all.
    if (!user) throw new ApiException(HttpStatus.NOT_FOUND, 'not_found', 'No such teacher in your school.');
    if (user.id === admin.id) throw new ApiException(HttpStatus.CONFLICT, 'cannot_change_self', 'You cannot deactivate your own account.');
    user.active = active;
    await this.users.save(user);
    if (!active) await this.auth.endAllSessions(user.id);
    return user;
  }
}
