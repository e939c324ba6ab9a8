import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { ClassesController } from './classes.controller';
import { ClassesService } from './classes.service';
import { ClassCoTeacherEntity } from './entities/class-co-teacher.entity';
import { ClassEntity } from './entities/class.entity';
import { PairRuleEntity } from './entities/pair-rule.entity';
import { RosterEntryEntity } from './entities/roster-entry.entity';
import { RosterService } from './roster.service';

@Module({
  imports: [TypeOrmModule.forFeature([ClassEntity, ClassCoTeacherEntity, RosterEntryEntity, PairRuleEntity])],
  controllers: [ClassesController],
  providers: [ClassesService, RosterService],
  exports: [ClassesService],
})
export class ClassesModule {}
