import { Flex, Grid } from '@radix-ui/themes';
import { useCurrentUser } from '@/features/auth/hooks/useCurrentUser';
import { CautionsCallout } from '@/features/dashboard/components/CautionsCallout';
import { SectionCard } from '@/features/dashboard/components/SectionCard';
import { PageHeader } from '@/features/shell/components/PageHeader';
import { routes } from '@/routes';

const SECTIONS = [
  { title: 'Classes', description: 'Your classes and their join settings.', to: routes.classes.build() },
  { title: 'Banks', description: 'Review items, grouped by topic, ready to reuse.', to: routes.banks.build() },
  { title: 'Sessions', description: 'Start a live review and host it on the room screen.', to: routes.sessions.build() },
  { title: 'Debriefs', description: 'What each session showed: items to revisit, how teams did.', to: routes.debriefs.build() },
] as const;

export function DashboardPage() {
  const me = useCurrentUser();
  return (
    <Flex direction="column" gap="6">
      <PageHeader title={`Hello, ${me.displayName}`} description={me.school.name} />
      <Grid columns={{ initial: '1', sm: '2' }} gap="4">
        {SECTIONS.map((section) => (
          <SectionCard key={section.to} {...section} />
        ))}
      </Grid>
      <CautionsCallout />
    </Flex>
  );
}
