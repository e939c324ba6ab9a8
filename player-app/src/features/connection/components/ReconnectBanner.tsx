import { useConnectionStore } from '@/stores/useConnectionStore';

/** Always mounted, so screen readers hear the text when it appears. */
export function ReconnectBanner() {
  const down = useConnectionStore((s) => s.status === 'reconnecting');
  return (
    <div className={down ? 'reconnect-banner' : 'reconnect-banner-idle'} role="status" aria-live="polite">
      {down ? 'Reconnecting… your answers are safe.' : ''}
    </div>
  );
}
