import { Transform } from 'class-transformer';
import { IsEmail, IsIn, IsInt, IsNotEmpty, IsOptional, IsString, IsUUID, Max, MaxLength, Min, ValidateIf } from 'class-validator';
import { PAIR_KINDS, type PairKind, TIME_MULTIPLIERS, type TimeMultiplier } from '@covalent/shared-types';
import { DISPLAY_NAME_MAX, SEAT_MAX, TABLE_GROUP_MAX } from '../csv/roster-csv';

const trim = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim().replace(/\s+/g, ' ') : value);

export class CreateClassDto {
  @Transform(trim) @IsString() @IsNotEmpty({ message: 'Give the class a name, e.g. "Chemistry".' }) @MaxLength(120)
  name: string;

  @IsOptional() @Transform(trim) @IsString() @MaxLength(40)
  period?: string;

  @IsOptional() @Transform(trim) @IsString() @MaxLength(40)
  term?: string;
}

export class UpdateClassDto {
  @IsOptional() @Transform(trim) @IsString() @IsNotEmpty({ message: 'A class needs a name.' }) @MaxLength(120)
  name?: string;

  @IsOptional() @Transform(trim) @IsString() @MaxLength(40)
  period?: string;

  @IsOptional() @Transform(trim) @IsString() @MaxLength(40)
  term?: string;
}

export class ListClassesQueryDto {
  @IsOptional() @IsIn(['true', 'false', 'all'])
  archived?: 'true' | 'false' | 'all';

  /** Admins only: 'school' lists every class of the school. */
  @IsOptional() @IsIn(['mine', 'school'])
  scope?: 'mine' | 'school';
}

export class AddCoTeacherDto {
  @ValidateIf((o: AddCoTeacherDto) => o.email === undefined)
  @IsUUID('all', { message: 'Name the colleague by userId or email.' })
  userId?: string;

  @ValidateIf((o: AddCoTeacherDto) => o.userId === undefined)
  @Transform(({ value }) => (typeof value === 'string' ? value.trim().toLowerCase() : value))
  @IsEmail({}, { message: 'Name the colleague by userId or email.' })
  email?: string;
}

export class CreateRosterEntryDto {
  @Transform(trim) @IsString() @IsNotEmpty({ message: 'Write the student\'s name as the class knows it.' }) @MaxLength(DISPLAY_NAME_MAX)
  displayName: string;

  @IsOptional() @Transform(trim) @ValidateIf((_, v) => v !== null) @IsString() @MaxLength(TABLE_GROUP_MAX)
  tableGroup?: string | null;

  @IsOptional() @ValidateIf((_, v) => v !== null) @IsInt() @Min(1) @Max(SEAT_MAX)
  seatNumber?: number | null;

  @IsOptional() @IsIn(TIME_MULTIPLIERS, { message: `The time multiplier is one of ${TIME_MULTIPLIERS.join(', ')}.` })
  timeMultiplier?: TimeMultiplier;
}

export class UpdateRosterEntryDto {
  @IsOptional() @Transform(trim) @IsString() @IsNotEmpty({ message: 'A roster entry needs a name.' }) @MaxLength(DISPLAY_NAME_MAX)
  displayName?: string;

  @IsOptional() @Transform(trim) @ValidateIf((_, v) => v !== null) @IsString() @MaxLength(TABLE_GROUP_MAX)
  tableGroup?: string | null;

  @IsOptional() @ValidateIf((_, v) => v !== null) @IsInt() @Min(1) @Max(SEAT_MAX)
  seatNumber?: number | null;

  @IsOptional() @IsIn(TIME_MULTIPLIERS, { message: `The time multiplier is one of ${TIME_MULTIPLIERS.join(', ')}.` })
  timeMultiplier?: TimeMultiplier;
}

export class CreatePairRuleDto {
  @IsIn(PAIR_KINDS, { message: 'Choose apart or together.' })
  kind: PairKind;

  @IsUUID('all') entryAId: string;

  @IsUUID('all') entryBId: string;
}

/** Multipart fields beside the roster CSV: `append` (default) adds rows, `replace` swaps the whole roster. */
export class ImportRosterDto {
  @IsOptional() @IsIn(['append', 'replace'])
  mode?: 'append' | 'replace';
}
