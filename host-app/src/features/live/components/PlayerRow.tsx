import type { PlayerStatus } from '@covalent/shared-types';
import { RemovePlayerButton } from './RemovePlayerButton';
import { RenamePlayerDialog } from './RenamePlayerDialog';

export interface PlayerRowProps {
  playerId: string;
  nickname: string;
  number?: number;
  status?: PlayerStatus;
}

/** One player in the lobby, with the teacher's rename and remove tools. */
export function PlayerRow({ playerId, nickname, number, status = 'connected' }: PlayerRowProps) {
  return (
    <li className="host-member" data-status={status}>
      <span className="host-member-name">
        {number !== undefined && <span aria-label={`number ${number}`}>{number}. </span>}
        {nickname}
        {status === 'away' && <span> (away)</span>}
      </span>
      <span className="host-member-tools">
        <RenamePlayerDialog playerId={playerId} nickname={nickname} />
        <RemovePlayerButton playerId={playerId} nickname={nickname} />
      </span>
    </li>
  );
}
