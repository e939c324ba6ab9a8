import { useCallback, useEffect, useState } from 'react';
import type { CatchupAnswerResponse, CatchupInfoResponse, CatchupStartResponse, ItemResponse } from '@covalent/shared-types';
import { catchupApi } from '../api/catchupApi';

export type CatchupState =
  | { phase: 'loading' }
  | { phase: 'failed'; message: string }
  | { phase: 'pick'; info: CatchupInfoResponse; pending: boolean; error: string | null }
  | {
      phase: 'playing';
      run: CatchupStartResponse;
      index: number;
      /** The server's verdict on the current item, once answered. */
      feedback: CatchupAnswerResponse | null;
      /** What the student sent for the current item (shown beside the right answer). */
      answered: ItemResponse | null;
      right: number;
      nextDueAt: string | null;
      pending: boolean;
      error: string | null;
    }
  | { phase: 'finished'; displayName: string; right: number; total: number; nextDueAt: string | null };

export interface Catchup {
  state: CatchupState;
  start: (rosterEntryId: string) => Promise<void>;
  answer: (response: ItemResponse) => Promise<void>;
  next: () => void;
}

/** One student's run through their due items: pick a name, answer each, see the verdict, finish. */
export function useCatchup(code: string): Catchup {
  const [state, setState] = useState<CatchupState>({ phase: 'loading' });

  useEffect(() => {
    let current = true;
    void catchupApi.info(code).then((info) => {
      if (!current) return;
      setState(info.ok ? { phase: 'pick', info, pending: false, error: null } : { phase: 'failed', message: info.message });
    });
    return () => {
      current = false;
    };
  }, [code]);

  const start = useCallback(
    async (rosterEntryId: string) => {
      if (state.phase !== 'pick' || state.pending) return;
      setState({ ...state, pending: true, error: null });
      const run = await catchupApi.start(code, rosterEntryId);
      if (!run.ok) return setState({ ...state, pending: false, error: run.message });
      setState(
        run.items.length === 0
          ? { phase: 'finished', displayName: run.displayName, right: 0, total: 0, nextDueAt: run.nextDueAt }
          : { phase: 'playing', run, index: 0, feedback: null, answered: null, right: 0, nextDueAt: run.nextDueAt, pending: false, error: null },
      );
    },
    [code, state],
  );

  const answer = useCallback(
    async (response: ItemResponse) => {
      if (state.phase !== 'playing' || state.pending || state.feedback) return;
      const item = state.run.items[state.index];
      if (!item) return;
      setState({ ...state, pending: true, error: null });
      const result = await catchupApi.answer({ token: state.run.token, itemId: item.itemId, response });
      if (!result.ok) return setState({ ...state, pending: false, error: result.message });
      setState({
        ...state,
        pending: false,
        feedback: result,
        answered: response,
        right: state.right + (result.correct ? 1 : 0),
        nextDueAt: result.nextDueAt,
      });
    },
    [state],
  );

  const next = useCallback(() => {
    if (state.phase !== 'playing' || !state.feedback) return;
    const index = state.index + 1;
    if (index < state.run.items.length) return setState({ ...state, index, feedback: null, answered: null, error: null });
    setState({ phase: 'finished', displayName: state.run.displayName, right: state.right, total: state.run.items.length, nextDueAt: state.nextDueAt });
  }, [state]);

  return { state, start, answer, next };
}
