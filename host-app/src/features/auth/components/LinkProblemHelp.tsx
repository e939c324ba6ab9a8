import { Link as ThemeLink } from '@radix-ui/themes';
import { Link } from 'react-router-dom';
import { routes } from '@/routes';

export interface LinkProblemHelpProps {
  kind: 'reset' | 'invite';
}

/** What to do next when an e-mailed link is missing, used or expired. */
export function LinkProblemHelp({ kind }: LinkProblemHelpProps) {
  if (kind === 'invite') return <>Your school administrator can send a new invitation.</>;
  return (
    <ThemeLink asChild>
      <Link to={routes.forgotPassword.build()}>Request a new reset link</Link>
    </ThemeLink>
  );
}
