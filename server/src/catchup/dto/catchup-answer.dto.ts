import { IsObject, IsString, IsUUID, MaxLength } from 'class-validator';

/** `POST /api/play/catchups/answers`; the response's shape is checked against the item in the service. */
export class CatchupAnswerDto {
  @IsString()
  @MaxLength(200)
  token: string;

  @IsUUID()
  itemId: string;

  @IsObject()
  response: Record<string, unknown>;
}
