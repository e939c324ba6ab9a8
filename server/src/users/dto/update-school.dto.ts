import { IsInt, Max, Min } from 'class-validator';

/** School-wide settings an administrator controls. */
export class UpdateSchoolSettingsDto {
  /** Days player data (nicknames, responses) is kept before the daily retention job deletes it. */
  @IsInt({ message: 'Retention is a whole number of days.' })
  @Min(1, { message: 'Keep player data at least one day.' })
  @Max(3650, { message: 'Keep player data at most ten years (3650 days).' })
  retentionDays: number;
}
