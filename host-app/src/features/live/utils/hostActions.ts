import type { HostCommand, HostSessionView } from '@covalent/shared-types';

/** A control of the host screen: its button label, its key (if any) and the command it sends. */
export interface HostAction {
  id: 'start' | 'open' | 'pause' | 'resume' | 'add_time' | 'close' | 'reveal' | 'next' | 'finish' | 'end';
  label: string;
  /** The single key that triggers it, upper case. */
  shortcut: string | null;
  command: HostCommand;
}

const ACTIONS = {
  start: { id: 'start', label: 'Start', shortcut: null, command: { type: 'start' } },
  open: { id: 'open', label: 'Open round', shortcut: 'N', command: { type: 'open_round' } },
  pause: { id: 'pause', label: 'Pause', shortcut: 'P', command: { type: 'pause' } },
  resume: { id: 'resume', label: 'Resume', shortcut: 'P', command: { type: 'resume' } },
  add_time: { id: 'add_time', label: '+15 s', shortcut: 'T', command: { type: 'add_time' } },
  close: { id: 'close', label: 'Close', shortcut: 'C', command: { type: 'close_round' } },
  reveal: { id: 'reveal', label: 'Reveal', shortcut: 'R', command: { type: 'reveal' } },
  next: { id: 'next', label: 'Next', shortcut: 'N', command: { type: 'next' } },
  finish: { id: 'finish', label: 'Show summary', shortcut: 'N', command: { type: 'end' } },
  end: { id: 'end', label: 'End', shortcut: null, command: { type: 'end' } },
} as const satisfies Record<HostAction['id'], HostAction>;

/** Whether the round's clock is stopped, by the session or the round. */
export function isPaused(view: HostSessionView): boolean {
  return view.session.status === 'paused' || view.round?.timing.paused === true;
}

/**
 * The controls that make sense right now, in button order. Buttons and keyboard shortcuts both
 * come from here, so a key can never do what no button offers.
 */
export function hostActions(view: HostSessionView): HostAction[] {
  const { status } = view.session;
  if (status === 'ended') return [];
  if (status === 'lobby') return [ACTIONS.start];

  const round = view.round;
  const actions: HostAction[] = [];
  if (!round || round.timing.status === 'ready') actions.push(ACTIONS.open);
  else if (round.timing.status === 'open') {
    actions.push(isPaused(view) ? ACTIONS.resume : ACTIONS.pause, ACTIONS.add_time, ACTIONS.close);
  } else if (round.timing.status === 'closed') actions.push(ACTIONS.reveal);
  else if (round.timing.status === 'revealed') {
    actions.push(round.itemIndex + 1 < round.itemCount ? ACTIONS.next : ACTIONS.finish);
  }
  actions.push(ACTIONS.end);
  return actions;
}

/** The command a key press sends now, or null. */
export function shortcutCommand(key: string, view: HostSessionView): HostCommand | null {
  const wanted = key.toUpperCase();
  return hostActions(view).find((action) => action.shortcut === wanted)?.command ?? null;
}
