import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  IsArray,
  IsIn,
  IsObject,
  IsOptional,
  IsString,
  IsUUID,
  Matches,
  MaxLength,
  ValidateIf,
  ValidateNested,
} from 'class-validator';
import { ITEM_TYPES, type ItemType } from '@covalent/shared-types';

export class ItemOptionDto {
  /** Keep an option's id across edits; leave it out for a new option and the server makes one. */
  @IsOptional() @IsString() @Matches(/^[A-Za-z0-9_-]{1,64}$/, { message: 'An option id is letters, digits, - or _.' })
  id?: string;

  @IsString() @MaxLength(500)
  text: string;
}

/**
 * An item as a client writes it. The key is checked by validateItemContent, which names fields
 * like `key.tolerance.value`; a key may point at a new option (no id yet) as "#0", "#1"…
 */
export class ItemInputDto {
  @IsIn(ITEM_TYPES, { message: 'Choose a question type.' })
  type: ItemType;

  @IsString({ message: 'Write the question prompt.' })
  prompt: string;

  @IsOptional() @IsArray() @ArrayMaxSize(8) @ValidateNested({ each: true }) @Type(() => ItemOptionDto)
  options?: ItemOptionDto[];

  @IsObject({ message: 'Set the answer key.' })
  key: Record<string, unknown>;

  @IsOptional() @IsString() @MaxLength(2000)
  explanation?: string;

  @IsOptional() @IsArray() @ArrayMaxSize(20) @IsString({ each: true })
  tags?: string[];

  @IsOptional() @ValidateIf((_, v) => v !== null) @IsUUID('all', { message: 'imageId must be the id of an uploaded image.' })
  imageId?: string | null;
}

export class ReorderItemsDto {
  @IsArray() @ArrayMaxSize(1000) @IsUUID('all', { each: true, message: 'itemIds must list item ids.' })
  itemIds: string[];
}
