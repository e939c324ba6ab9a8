import type { EntityManager } from 'typeorm';

/**
 * Closes the open catch-ups of one session or one class that deletions (a student's data,
 * a roster entry, a replaced roster) left without cards: nobody is left to serve, so the
 * code stops working instead of listing no one. Run inside the deleting transaction.
 */
export async function closeEmptyCatchups(m: EntityManager, scope: { sessionId: string } | { classId: string }): Promise<void> {
  const [column, id] = 'sessionId' in scope ? ['session_id', scope.sessionId] : ['class_id', scope.classId];
  await m.query(
    `UPDATE catchups c SET closed_at = now(), updated_at = now()
      WHERE c.${column} = $1 AND c.closed_at IS NULL
        AND NOT EXISTS (SELECT 1 FROM catchup_cards k WHERE k.catchup_id = c.id)`,
    [id],
  );
}
