import { TeamCard } from '@/features/team';
import { useGameStore } from '@/stores/useGameStore';

/** Before the first round (and between rounds without one on screen). */
export function LobbyScreen() {
  const status = useGameStore((s) => s.status);
  const you = useGameStore((s) => s.you);
  const team = useGameStore((s) => s.team);
  const format = useGameStore((s) => s.format);
  return (
    <section className="lobby" aria-labelledby="lobby-title">
      <h1 id="lobby-title" className="page-title">
        {status === 'lobby' ? "You're in. Waiting for your teacher to start." : 'Get ready — the next round opens soon.'}
      </h1>
      {you && (
        <p>
          You are in as <strong className="joined-name">{you.nickname}</strong>. Keep this page open.
        </p>
      )}
      {team && you ? (
        <TeamCard team={team} playerId={you.playerId} format={format} />
      ) : (
        <p className="field-hint">Your team will appear here when your teacher forms the teams.</p>
      )}
    </section>
  );
}
