import { Badge } from '@radix-ui/themes';

export interface CatchupStatusBadgeProps {
  closedAt: string | null;
}

/** Open or closed, as a word. */
export function CatchupStatusBadge({ closedAt }: CatchupStatusBadgeProps) {
  return closedAt ? (
    <Badge color="gray" variant="soft">
      closed
    </Badge>
  ) : (
    <Badge color="green" variant="soft">
      open
    </Badge>
  );
}
