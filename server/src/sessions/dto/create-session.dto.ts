import { FORMATS, MIXER_MODES, NAME_PACKS, STANDINGS_VIEWS, type CreateSessionRequest, type Format, type MixerMode, type NamePack, type StandingsView } from '@covalent/shared-types';
import { ArrayMaxSize, ArrayMinSize, ArrayUnique, IsArray, IsIn, IsInt, IsNumber, IsOptional, IsUUID, Max, Min, ValidateIf } from 'class-validator';

export const ROUND_SECONDS = { min: 5, max: 600 } as const;
export const MAX_SESSION_ITEMS = 200;

/** `POST /api/sessions`. */
export class CreateSessionDto implements CreateSessionRequest {
  @IsUUID()
  bankId: string;

  @IsOptional()
  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(MAX_SESSION_ITEMS)
  @ArrayUnique()
  @IsUUID('all', { each: true })
  itemIds?: string[];

  @ValidateIf((_, v) => v !== null)
  @IsUUID()
  classId: string | null;

  @IsIn(FORMATS)
  format: Format;

  @IsInt()
  @Min(ROUND_SECONDS.min)
  @Max(ROUND_SECONDS.max)
  roundSeconds: number;

  @IsNumber({ allowNaN: false, allowInfinity: false })
  @Min(0)
  @Max(1)
  speedWeight: number;

  @IsIn(STANDINGS_VIEWS)
  standings: StandingsView;

  @IsOptional()
  @IsInt()
  @Min(1)
  @Max(50)
  teamCount?: number;

  @IsOptional()
  @IsInt()
  @Min(1)
  @Max(20)
  targetTeamSize?: number;

  @IsIn(MIXER_MODES)
  mixerMode: MixerMode;

  @IsIn(NAME_PACKS)
  namePack: NamePack;
}
