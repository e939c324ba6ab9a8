import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { SchoolEntity } from './entities/school.entity';
import { UserEntity } from './entities/user.entity';
import { SchoolController } from './school.controller';
import { UsersController } from './users.controller';
import { UsersService } from './users.service';

@Module({
  imports: [TypeOrmModule.forFeature([UserEntity, SchoolEntity])],
  controllers: [UsersController, SchoolController],
  providers: [UsersService],
  exports: [UsersService],
})
export class UsersModule {}
