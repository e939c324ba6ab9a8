import type { HostSessionView } from '@covalent/shared-types';
import { useEffect } from 'react';
import { sendHostCommand } from '@/realtime';
import { shortcutCommand } from '../utils/hostActions';

function isTyping(target: EventTarget | null): boolean {
  if (!(target instanceof HTMLElement)) return false;
  return target.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(target.tagName);
}

/** N, P, R, C, T drive the round from the keyboard; ignored while typing or with a modifier held. */
export function useHostShortcuts(view: HostSessionView | null): void {
  useEffect(() => {
    if (!view) return undefined;
    const onKeyDown = (event: KeyboardEvent) => {
      if (event.repeat || event.ctrlKey || event.metaKey || event.altKey || isTyping(event.target)) return;
      const command = shortcutCommand(event.key, view);
      if (!command) return;
      event.preventDefault();
      void sendHostCommand(command);
    };
    window.addEventListener('keydown', onKeyDown);
    return () => window.removeEventListener('keydown', onKeyDown);
  }, [view]);
}
