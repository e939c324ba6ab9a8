export interface JoinedNoticeProps {
  nickname: string;
}

export function JoinedNotice({ nickname }: JoinedNoticeProps) {
  return (
    <section className="joined" role="status" aria-live="polite">
      <h2 className="joined-title">Joined — waiting for your teacher to start</h2>
      <p>
        You are in as <strong className="joined-name">{nickname}</strong>. Keep this page open; your
        team will appear here.
      </p>
    </section>
  );
}
