import { Body, Controller, Get, Patch } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { SchoolSettingsDto } from '@covalent/shared-types';
import { Repository } from 'typeorm';
import { CurrentUser, Roles } from '../common/decorators';
import { UpdateSchoolSettingsDto } from './dto/update-school.dto';
import { SchoolEntity } from './entities/school.entity';
import { UserEntity } from './entities/user.entity';

/** The admin's own school: retention of player data. */
@Controller('admin/school')
@Roles('admin')
export class SchoolController {
  constructor(@InjectRepository(SchoolEntity) private readonly schools: Repository<SchoolEntity>) {}

  @Get()
  async get(@CurrentUser() admin: UserEntity): Promise<SchoolSettingsDto> {
    const s = await this.schools.findOneByOrFail({ id: admin.schoolId });
    return { id: s.id, name: s.name, retentionDays: s.retentionDays };
  }

  @Patch()
  async update(@CurrentUser() admin: UserEntity, @Body() dto: UpdateSchoolSettingsDto): Promise<SchoolSettingsDto> {
    await this.schools.update({ id: admin.schoolId }, { retentionDays: dto.retentionDays });
    return this.get(admin);
  }
}
