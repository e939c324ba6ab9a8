import { describe, expect, it } from 'vitest';
import { makeHostView, makeRunningView, makeSessionDto, makeTiming } from '../testing/liveFactories';
import { hostActions, shortcutCommand } from './hostActions';

describe('shortcutCommand', () => {
  it('maps N P C T to the open round and R only once it is closed', () => {
    const open = makeRunningView();
    expect(shortcutCommand('p', open)).toEqual({ type: 'pause' });
    expect(shortcutCommand('C', open)).toEqual({ type: 'close_round' });
    expect(shortcutCommand('t', open)).toEqual({ type: 'add_time' });
    expect(shortcutCommand('r', open)).toBeNull();
    expect(shortcutCommand('r', makeRunningView({ timing: makeTiming({ status: 'closed' }) }))).toEqual({ type: 'reveal' });
    expect(shortcutCommand('n', makeRunningView({ timing: makeTiming({ status: 'ready' }) }))).toEqual({ type: 'open_round' });
  });

  it('turns P into resume while paused and N into next after a reveal', () => {
    expect(shortcutCommand('p', makeRunningView({ timing: makeTiming({ paused: true }) }))).toEqual({ type: 'resume' });
    expect(shortcutCommand('n', makeRunningView({ timing: makeTiming({ status: 'revealed' }) }))).toEqual({ type: 'next' });
  });

  it('ends the session with N after the last item is revealed', () => {
    const last = makeRunningView({ itemIndex: 7, itemCount: 8, timing: makeTiming({ status: 'revealed' }) });
    expect(shortcutCommand('n', last)).toEqual({ type: 'end' });
  });

  it('does nothing in the lobby or after the end', () => {
    expect(shortcutCommand('n', makeHostView())).toBeNull();
    expect(hostActions(makeHostView({ session: makeSessionDto({ status: 'ended' }) }))).toEqual([]);
  });
});
