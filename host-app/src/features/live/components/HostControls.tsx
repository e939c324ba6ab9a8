import type { HostSessionView } from '@covalent/shared-types';
import { Button } from '@radix-ui/themes';
import type { ReactNode } from 'react';
import { sendHostCommand } from '@/realtime';
import { useHostSessionStore } from '@/stores/useHostSessionStore';
import { hostActions } from '../utils/hostActions';
import { EndSessionButton } from './EndSessionButton';

export interface HostControlsProps {
  view: HostSessionView;
  /** Controls of one screen only (Reshuffle, Lock joining), placed before the main ones. */
  children?: ReactNode;
}

/** The teacher's buttons for the current state; the same list drives the keyboard shortcuts. */
export function HostControls({ view, children }: HostControlsProps) {
  const pending = useHostSessionStore((s) => s.pendingCommand);
  const actions = hostActions(view);
  return (
    <div className="host-controls" role="group" aria-label="Session controls">
      {children}
      {actions.map((action, index) =>
        action.id === 'end' ? (
          <EndSessionButton key={action.id} />
        ) : (
          <Button
            key={action.id}
            size="4"
            variant={index === 0 ? 'solid' : 'soft'}
            loading={pending === action.command.type}
            aria-keyshortcuts={action.shortcut ?? undefined}
            onClick={() => void sendHostCommand(action.command)}
          >
            {action.label}
          </Button>
        ),
      )}
    </div>
  );
}
