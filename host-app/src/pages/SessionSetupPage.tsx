import { useNavigate, useSearchParams } from 'react-router-dom';
import { SessionSetupForm } from '@/features/sessions/components/SessionSetupForm';
import { PageHeader } from '@/features/shell/components/PageHeader';
import { routes } from '@/routes';

export function SessionSetupPage() {
  const navigate = useNavigate();
  const [search] = useSearchParams();
  return (
    <>
      <PageHeader title="New session" description="Choose what to play and how; students join once the host screen is up." />
      <SessionSetupForm
        initialBankId={search.get('bankId') ?? ''}
        initialClassId={search.get('classId') ?? ''}
        onCreated={(session) => navigate(routes.hostSession.build(session.id))}
      />
    </>
  );
}
