import { Callout } from '@radix-ui/themes';
import { Link } from 'react-router-dom';
import { routes } from '@/routes';
import { useHostSessionStore } from '@/stores/useHostSessionStore';
import { useHostShortcuts } from '../hooks/useHostShortcuts';
import { useSessionBank } from '../hooks/useSessionBank';
import { needsSafetyCaution } from '../utils/needsSafetyCaution';
import { EndView } from './EndView';
import { HostControls } from './HostControls';
import { KeyboardLegend } from './KeyboardLegend';
import { LobbyView } from './LobbyView';
import { RevealView } from './RevealView';
import { RoundView } from './RoundView';
import { SafetyCaution } from './SafetyCaution';
import '../hostScreen.css';

export interface HostScreenProps {
  /** The origin students use, e.g. `https://covalent.school.example`. */
  origin: string;
}

const FORMAT_NAMES = { huddle: 'huddle', numbered: 'numbered', solo: 'solo' } as const;

/** The projected screen: whatever state the live session is in, in type big enough for the back row. */
export function HostScreen({ origin }: HostScreenProps) {
  const view = useHostSessionStore((s) => s.view);
  const status = useHostSessionStore((s) => s.status);
  const statusMessage = useHostSessionStore((s) => s.statusMessage);
  const commandError = useHostSessionStore((s) => s.commandError);
  const bank = useSessionBank(view?.session.bankId);
  useHostShortcuts(view);

  const round = view?.round ?? null;
  const showSafety = needsSafetyCaution(bank.data, round?.item.prompt ?? null);
  const showLegend = view !== null && view.session.status !== 'lobby' && view.session.status !== 'ended';

  return (
    <div className="host-screen">
      <title>{view ? `${view.session.bankTitle} · Host · Covalent` : 'Host screen · Covalent'}</title>
      <header className="host-topbar">
        <span>
          <strong>Covalent</strong>
          {view && (
            <>
              {' · '}
              {view.session.bankTitle}
              {view.session.className ? ` · ${view.session.className}` : ' · ad-hoc group'}
              {' · '}
              {FORMAT_NAMES[view.session.format]}
            </>
          )}
        </span>
        <Link to={routes.sessions.build()}>Leave host screen</Link>
      </header>

      {status !== 'connected' && statusMessage && (
        <Callout.Root color={status === 'failed' ? 'red' : 'gray'} role={status === 'failed' ? 'alert' : 'status'}>
          <Callout.Text size="4">{statusMessage}</Callout.Text>
        </Callout.Root>
      )}
      {commandError && (
        <Callout.Root color="red" role="alert">
          <Callout.Text size="4">{commandError}</Callout.Text>
        </Callout.Root>
      )}
      {showSafety && <SafetyCaution />}

      <main className="host-main">
        {!view ? (
          <p className="host-heading" role="status">
            Connecting to the session…
          </p>
        ) : view.session.status === 'lobby' ? (
          <LobbyView view={view} origin={origin} />
        ) : view.session.status === 'ended' ? (
          <EndView view={view} />
        ) : round?.reveal ? (
          <RevealView view={view} round={round} reveal={round.reveal} />
        ) : round ? (
          <RoundView view={view} round={round} />
        ) : (
          <div className="host-main">
            <h2 className="host-heading">Teams are set. Open the first round when the class is ready.</h2>
            <HostControls view={view} />
          </div>
        )}
      </main>

      {showLegend && <KeyboardLegend />}
    </div>
  );
}
