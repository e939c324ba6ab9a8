import { IsOptional, IsString, IsUUID, MaxLength, ValidateIf } from 'class-validator';

/** `POST /api/play/join`: a code and either a nickname or a roster entry. */
export class JoinDto {
  @IsString()
  @MaxLength(20)
  code: string;

  @ValidateIf((o: JoinDto) => o.rosterEntryId === undefined)
  @IsString({ message: 'Type a nickname or pick your name from the list.' })
  @MaxLength(100)
  nickname?: string;

  @IsOptional()
  @IsUUID()
  rosterEntryId?: string;
}
