import { HttpStatus, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { ClassAccess, ClassDetailDto, ClassDto } from '@covalent/shared-types';
import { DataSource, EntityManager, In } from 'typeorm';
import { findColleague } from '../banks/colleague';
import { ApiException } from '../common/api-error';
import { UserEntity } from '../users/entities/user.entity';
import { toClassDetailDto, toClassDto } from './classes.mapper';
import { AddCoTeacherDto, CreateClassDto, ListClassesQueryDto, UpdateClassDto } from './dto/class.dto';
import { ClassCoTeacherEntity } from './entities/class-co-teacher.entity';
import { ClassEntity } from './entities/class.entity';
import { PairRuleEntity } from './entities/pair-rule.entity';
import { RosterEntryEntity } from './entities/roster-entry.entity';

/** 'read': owner, co-teachers, same-school admin. 'own': the owner alone (class details and roster alike). */
export type ClassNeed = 'read' | 'own';

export interface AccessibleClass {
  cls: ClassEntity;
  access: ClassAccess;
}

const notFound = () => new ApiException(HttpStatus.NOT_FOUND, 'not_found', 'No such class.');

@Injectable()
export class ClassesService {
  constructor(@InjectDataSource() private readonly db: DataSource) {}

  async access(user: UserEntity, classId: string, need: ClassNeed, manager: EntityManager = this.db.manager): Promise<AccessibleClass> {
    const cls = await manager.getRepository(ClassEntity).findOne({ where: { id: classId, schoolId: user.schoolId }, relations: { owner: true } });
    if (!cls) throw notFound();
    let access: ClassAccess | null = null;
    if (cls.ownerId === user.id) access = 'owner';
    else if (await manager.getRepository(ClassCoTeacherEntity).exists({ where: { classId, userId: user.id } })) access = 'co-teacher';
    else if (user.role === 'admin') access = 'admin';
    if (!access) throw notFound();
    if (need === 'own' && access !== 'owner') {
      throw new ApiException(HttpStatus.FORBIDDEN, 'forbidden', 'Only the class\'s owner can change the class and its roster.');
    }
    return { cls, access };
  }

  async list(user: UserEntity, query: ListClassesQueryDto): Promise<ClassDto[]> {
    const qb = this.db
      .getRepository(ClassEntity)
      .createQueryBuilder('cls')
      .leftJoinAndSelect('cls.owner', 'owner')
      .leftJoin(ClassCoTeacherEntity, 'co', 'co.class_id = cls.id AND co.user_id = :uid', { uid: user.id })
      .where('cls.school_id = :school', { school: user.schoolId });
    if (!(user.role === 'admin' && query.scope === 'school')) qb.andWhere('(cls.owner_id = :uid OR co.id IS NOT NULL)');
    const archived = query.archived ?? 'false';
    if (archived === 'false') qb.andWhere('cls.archived_at IS NULL');
    if (archived === 'true') qb.andWhere('cls.archived_at IS NOT NULL');
    const classes = await qb.orderBy('cls.term', 'DESC').addOrderBy('cls.period', 'ASC').addOrderBy('cls.name', 'ASC').getMany();
    if (classes.length === 0) return [];
    const ids = classes.map((c) => c.id);
    const [coTeachers, counts] = await Promise.all([
      this.db.getRepository(ClassCoTeacherEntity).find({ where: { classId: In(ids) }, relations: { user: true }, order: { createdAt: 'ASC' } }),
      this.db.query('SELECT class_id, COUNT(*)::int AS n FROM roster_entries WHERE class_id = ANY($1) GROUP BY class_id', [ids]) as Promise<
        { class_id: string; n: number }[]
      >,
    ]);
    const count = new Map(counts.map((c) => [c.class_id, c.n]));
    return classes.map((cls) => {
      const mine = coTeachers.filter((c) => c.classId === cls.id);
      const access: ClassAccess = cls.ownerId === user.id ? 'owner' : mine.some((c) => c.userId === user.id) ? 'co-teacher' : 'admin';
      return toClassDto(cls, access, count.get(cls.id) ?? 0, mine);
    });
  }

  async create(user: UserEntity, dto: CreateClassDto): Promise<ClassDetailDto> {
    const repo = this.db.getRepository(ClassEntity);
    const cls = await repo.save(
      repo.create({ ownerId: user.id, schoolId: user.schoolId, name: dto.name, period: dto.period ?? '', term: dto.term ?? '', archivedAt: null }),
    );
    return this.detail(user, cls.id);
  }

  async detail(user: UserEntity, classId: string): Promise<ClassDetailDto> {
    const { cls, access } = await this.access(user, classId, 'read');
    const [coTeachers, roster, pairs] = await Promise.all([
      this.db.getRepository(ClassCoTeacherEntity).find({ where: { classId }, relations: { user: true }, order: { createdAt: 'ASC' } }),
      this.db.getRepository(RosterEntryEntity).find({ where: { classId }, order: { tableGroup: 'ASC', seatNumber: 'ASC', displayName: 'ASC' } }),
      this.db.getRepository(PairRuleEntity).find({ where: { classId }, order: { createdAt: 'ASC' } }),
    ]);
    return toClassDetailDto(cls, access, coTeachers, roster, pairs);
  }

  async update(user: UserEntity, classId: string, dto: UpdateClassDto): Promise<ClassDetailDto> {
    const { cls } = await this.access(user, classId, 'own');
    if (dto.name !== undefined) cls.name = dto.name;
    if (dto.period !== undefined) cls.period = dto.period;
    if (dto.term !== undefined) cls.term = dto.term;
    await this.db.getRepository(ClassEntity).save(cls);
    return this.detail(user, classId);
  }

  async setArchived(user: UserEntity, classId: string, archived: boolean): Promise<ClassDetailDto> {
    const { cls } = await this.access(user, classId, 'own');
    cls.archivedAt = archived ? (cls.archivedAt ?? new Date()) : null;
    await this.db.getRepository(ClassEntity).save(cls);
    return this.detail(user, classId);
  }

  async addCoTeacher(user: UserEntity, classId: string, dto: AddCoTeacherDto): Promise<ClassDetailDto> {
    await this.access(user, classId, 'own');
    const colleague = await findColleague(this.db.manager, user, dto);
    await this.db.getRepository(ClassCoTeacherEntity).upsert({ classId, userId: colleague.id }, { conflictPaths: ['classId', 'userId'] });
    return this.detail(user, classId);
  }

  async removeCoTeacher(user: UserEntity, classId: string, userId: string): Promise<void> {
    await this.access(user, classId, 'own');
    const { affected } = await this.db.getRepository(ClassCoTeacherEntity).delete({ classId, userId });
    if (!affected) throw new ApiException(HttpStatus.NOT_FOUND, 'not_found', 'That teacher is not a co-teacher of this class.');
  }
}
