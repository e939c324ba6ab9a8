import { RETENTION_DAYS_MAX, RETENTION_DAYS_MIN, type UpdateSchoolSettingsRequest } from '@covalent/shared-types';
import { IsInt, Max, Min } from 'class-validator';

/** School-wide settings an administrator controls. */
export class UpdateSchoolSettingsDto implements UpdateSchoolSettingsRequest {
  /** Days player data (nicknames, responses) is kept before the daily retention job deletes it. */
  @IsInt({ message: 'Retention is a whole number of days.' })
  @Min(RETENTION_DAYS_MIN, { message: 'Keep player data at least one day.' })
  @Max(RETENTION_DAYS_MAX, { message: 'Keep player data at most ten years (3650 days).' })
  retentionDays: number;
}
