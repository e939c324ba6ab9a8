import { Transform } from 'class-transformer';
import {
  ArrayMaxSize,
  IsArray,
  IsEmail,
  IsIn,
  IsNotEmpty,
  IsOptional,
  IsString,
  IsUUID,
  MaxLength,
  ValidateIf,
} from 'class-validator';
import { BANK_SORTS, type BankSort, SHARE_ACCESS, type ShareAccess } from '@covalent/shared-types';

const trim = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value);
const trimList = ({ value }: { value: unknown }) =>
  Array.isArray(value) ? value.map((v) => (typeof v === 'string' ? v.trim() : v)).filter((v) => v !== '') : value;

export const BANK_TITLE_MAX = 120;
export const BANK_DESCRIPTION_MAX = 2000;

export class CreateBankDto {
  @Transform(trim)
  @IsString() @IsNotEmpty({ message: 'Give the bank a title.' }) @MaxLength(BANK_TITLE_MAX)
  title: string;

  @IsOptional() @Transform(trim) @IsString() @MaxLength(BANK_DESCRIPTION_MAX)
  description?: string;

  @IsOptional() @Transform(trimList) @IsArray() @ArrayMaxSize(20) @IsString({ each: true }) @MaxLength(40, { each: true })
  tags?: string[];

  @IsOptional() @Transform(trim) @IsString() @MaxLength(60)
  standardsCode?: string | null;
}

/** PATCH: any subset of the bank's details. */
export class UpdateBankDto {
  @IsOptional() @Transform(trim)
  @IsString() @IsNotEmpty({ message: 'A bank needs a title.' }) @MaxLength(BANK_TITLE_MAX)
  title?: string;

  @IsOptional() @Transform(trim) @IsString() @MaxLength(BANK_DESCRIPTION_MAX)
  description?: string;

  @IsOptional() @Transform(trimList) @IsArray() @ArrayMaxSize(20) @IsString({ each: true }) @MaxLength(40, { each: true })
  tags?: string[];

  /** null or "" clears it. */
  @IsOptional() @Transform(trim) @ValidateIf((_, v) => v !== null) @IsString() @MaxLength(60)
  standardsCode?: string | null;
}

export class ListBanksQueryDto {
  /** Title substring, case-insensitive. */
  @IsOptional() @Transform(trim) @IsString() @MaxLength(120)
  q?: string;

  @IsOptional() @Transform(trim) @IsString() @MaxLength(40)
  tag?: string;

  /** 'false' (default): in use; 'true': archived only; 'all'. */
  @IsOptional() @IsIn(['true', 'false', 'all'])
  archived?: 'true' | 'false' | 'all';

  @IsOptional() @IsIn(BANK_SORTS)
  sort?: BankSort;

  @IsOptional() @IsIn(['asc', 'desc'])
  dir?: 'asc' | 'desc';

  /** Admins only: 'school' lists every bank of the school. */
  @IsOptional() @IsIn(['mine', 'school'])
  scope?: 'mine' | 'school';
}

export class DuplicateBankDto {
  @IsOptional() @Transform(trim)
  @IsString() @IsNotEmpty() @MaxLength(BANK_TITLE_MAX)
  title?: string;
}

/** Share with a colleague named by id or by school e-mail address. */
export class ShareBankDto {
  @ValidateIf((o: ShareBankDto) => o.email === undefined)
  @IsUUID('all', { message: 'Name the colleague by userId or email.' })
  userId?: string;

  @ValidateIf((o: ShareBankDto) => o.userId === undefined)
  @Transform(({ value }) => (typeof value === 'string' ? value.trim().toLowerCase() : value))
  @IsEmail({}, { message: 'Name the colleague by userId or email.' })
  email?: string;

  @IsIn(SHARE_ACCESS, { message: 'Choose view or edit access.' })
  access: ShareAccess;
}

/** Multipart fields beside the CSV file of `POST /api/banks/import`. */
export class ImportBankDto {
  @IsOptional() @Transform(trim)
  @IsString() @IsNotEmpty() @MaxLength(BANK_TITLE_MAX)
  title?: string;
}

