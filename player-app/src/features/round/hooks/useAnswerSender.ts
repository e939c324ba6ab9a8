import { useState } from 'react';
import type { ItemResponse } from '@covalent/shared-types';
import { lockAnswer, submitAnswer } from '@/realtime';

export interface AnswerSender {
  pending: boolean;
  /** The server's (or the connection's) message after a failed send. */
  message: string | null;
  send: (response: ItemResponse, lock?: boolean) => Promise<boolean>;
  lock: () => Promise<boolean>;
}

/** Sends answers for one round and keeps the failure message to show. */
export function useAnswerSender(roundIndex: number): AnswerSender {
  const [pending, setPending] = useState(false);
  const [message, setMessage] = useState<string | null>(null);

  async function run(task: () => Promise<{ ok: true } | { ok: false; message: string }>): Promise<boolean> {
    setPending(true);
    setMessage(null);
    try {
      const ack = await task();
      if (!ack.ok) setMessage(ack.message);
      return ack.ok;
    } finally {
      setPending(false);
    }
  }

  return {
    pending,
    message,
    send: (response, lock) => run(() => submitAnswer(roundIndex, response, lock)),
    lock: () => run(() => lockAnswer(roundIndex)),
  };
}
