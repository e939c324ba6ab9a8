import { ReconnectBanner, RemovedScreen } from '@/features/connection';
import { LobbyScreen } from '@/features/lobby';
import { EndSummary, ResultScreen } from '@/features/result';
import { AnswerScreen, RoundWaiting } from '@/features/round';
import { TeamBadge } from '@/features/team';
import { useGameStore } from '@/stores/useGameStore';

function CurrentScreen() {
  const loaded = useGameStore((s) => s.loaded);
  const removedMessage = useGameStore((s) => s.removedMessage);
  const status = useGameStore((s) => s.status);
  const round = useGameStore((s) => s.round);

  if (removedMessage !== null) return <RemovedScreen message={removedMessage} />;
  if (!loaded) return <p className="loading">Connecting…</p>;
  if (status === 'ended') return <EndSummary />;
  if (!round) return <LobbyScreen />;
  if (round.reveal) return <ResultScreen round={round} reveal={round.reveal} />;
  // Keyed by round so a new round starts with a fresh draft and moves focus to its prompt.
  if (round.timing.status === 'open') return <AnswerScreen key={round.timing.roundIndex} round={round} />;
  return <RoundWaiting round={round} />;
}

/** The live game, from the lobby to the end summary. */
export function GamePage() {
  const team = useGameStore((s) => s.team);
  const number = useGameStore((s) => (s.format === 'numbered' ? (s.you?.number ?? null) : null));
  const inRound = useGameStore((s) => s.round !== null && s.status !== 'ended');
  return (
    <div className="page">
      <header className="page-header game-header">
        <p className="wordmark">
          <span className="wordmark-mark" aria-hidden="true" />
          Covalent
        </p>
        {team && inRound && <TeamBadge team={team} number={number} />}
      </header>
      <ReconnectBanner />
      <main className="page-main">
        <div className="panel">
          <CurrentScreen />
        </div>
      </main>
    </div>
  );
}
