import { playerAddress } from '../utils/playerAddress';
import { JoinQrCode } from './JoinQrCode';

export interface JoinCodePanelProps {
  joinCode: string;
  joiningLocked: boolean;
  origin: string;
}

/** How students get in: the address, the code in very large type, and a QR code with both. */
export function JoinCodePanel({ joinCode, joiningLocked, origin }: JoinCodePanelProps) {
  return (
    <section className="host-panel host-join" aria-labelledby="join-heading">
      <h2 id="join-heading" className="host-join-label">
        {joiningLocked ? 'Joining is locked' : 'Join at'}
      </h2>
      <p className="host-join-address">{playerAddress(origin)}</p>
      <p className="host-join-label" aria-hidden="true">
        with code
      </p>
      <p className="host-join-code">{joinCode}</p>
      <JoinQrCode url={playerAddress(origin, joinCode)} joinCode={joinCode} />
      <p className="host-caution">For practice and review, not for grading.</p>
    </section>
  );
}
