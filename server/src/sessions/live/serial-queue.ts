/**
 * Runs tasks one at a time in arrival order. Every change to one live session
 * goes through its queue, so the engine, the database and the broadcasts see
 * the same order (an answer is stored before the round can close past it).
 */
export class SerialQueue {
  private tail: Promise<unknown> = Promise.resolve();

  run<T>(task: () => Promise<T> | T): Promise<T> {
    const result = this.tail.then(task);
    this.tail = result.catch(() => undefined);
    return result;
  }

  /** Resolves once everything queued so far has finished. */
  idle(): Promise<void> {
    return this.tail.then(() => undefined);
  }
}
