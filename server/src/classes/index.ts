export { ClassesModule } from './classes.module';
export { ClassesService, type AccessibleClass, type ClassNeed } from './classes.service';
export { ROSTER_CSV_COLUMNS, rowsToEntries, nameKey } from './csv/roster-csv';
export { ClassEntity } from './entities/class.entity';
export { ClassCoTeacherEntity } from './entities/class-co-teacher.entity';
export { RosterEntryEntity } from './entities/roster-entry.entity';
export { PairRuleEntity } from './entities/pair-rule.entity';
