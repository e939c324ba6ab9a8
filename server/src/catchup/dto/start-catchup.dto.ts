import { IsUUID } from 'class-validator';

/** `POST /api/play/catchups/:code/start`: the student's name from the list. */
export class StartCatchupDto {
  @IsUUID()
  rosterEntryId: string;
}
