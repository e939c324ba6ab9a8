import { Body, Controller, Get, HttpCode, HttpStatus, Param, ParseUUIDPipe, Post } from '@nestjs/common';
import type { StaffUserDto } from '@covalent/shared-types';
import { CurrentUser, Roles } from '../common/decorators';
import { InviteTeacherDto } from './dto/invite-teacher.dto';
import { UserEntity } from './entities/user.entity';
import { toStaffUserDto } from './users.mapper';
import { UsersService } from './users.service';

/** School administration: only admins, only their own school. */
@Controller('admin/users')
@Roles('admin')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Get()
  async list(@CurrentUser() admin: UserEntity): Promise<StaffUserDto[]> {
    return (await this.users.listStaff(admin)).map(toStaffUserDto);
  }

  @Post('invitations')
  @HttpCode(HttpStatus.CREATED)
  async invite(@CurrentUser() admin: UserEntity, @Body() dto: InviteTeacherDto): Promise<StaffUserDto> {
    return toStaffUserDto(await this.users.invite(admin, dto));
  }

  @Post(':id/deactivate')
  @HttpCode(HttpStatus.OK)
  async deactivate(@CurrentUser() admin: UserEntity, @Param('id', new ParseUUIDPipe()) id: string): Promise<StaffUserDto> {
    return toStaffUserDto(await this.users.setActive(admin, id, false));
  }

  @Post(':id/reactivate')
  @HttpCode(HttpStatus.OK)
  async reactivate(@CurrentUser() admin: UserEntity, @Param('id', new ParseUUIDPipe()) id: string): Promise<StaffUserDto> {
    return toStaffUserDto(await this.users.setActive(admin, id, true));
  }
}
