import { Badge, Button, Card, Flex, Heading, Tabs, Text } from '@radix-ui/themes';
import { Link, useParams } from 'react-router-dom';
import { AddRosterEntryForm } from '@/features/classes/components/AddRosterEntryForm';
import { ClassDetailsForm } from '@/features/classes/components/ClassDetailsForm';
import { CoTeachersCard } from '@/features/classes/components/CoTeachersCard';
import { ImportRosterDialog } from '@/features/classes/components/ImportRosterDialog';
import { PairRulesCard } from '@/features/classes/components/PairRulesCard';
import { RosterPrivacyNote } from '@/features/classes/components/RosterPrivacyNote';
import { RosterTable } from '@/features/classes/components/RosterTable';
import { SeatMap } from '@/features/classes/components/SeatMap';
import { useClass } from '@/features/classes/hooks/useClass';
import { useClassMutations } from '@/features/classes/hooks/useClassMutations';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { EmptyState } from '@/features/shell/components/EmptyState';
import { PageFallback } from '@/features/shell/components/PageFallback';
import { PageHeader } from '@/features/shell/components/PageHeader';
import { routes } from '@/routes';

export function ClassDetailPage() {
  const { classId = '' } = useParams();
  const cls = useClass(classId);
  const m = useClassMutations(classId);

  if (cls.isPending) return <PageFallback label="Loading class…" />;
  if (cls.isError) {
    return (
      <Flex direction="column" gap="3" align="start">
        <PageHeader title="Class" />
        <FormErrorCallout message={cls.error.message} />
        <Button asChild variant="soft">
          <Link to={routes.classes.build()}>Back to classes</Link>
        </Button>
      </Flex>
    );
  }

  const data = cls.data;
  const owner = data.access === 'owner';
  const subtitle = [data.period && `Period ${data.period}`, data.term].filter(Boolean).join(' · ');

  return (
    <Flex direction="column" gap="5">
      <PageHeader
        title={data.name}
        description={
          <Flex as="span" gap="2" align="center" wrap="wrap">
            {subtitle && <span>{subtitle}</span>}
            <span>
              · {data.rosterCount} {data.rosterCount === 1 ? 'student' : 'students'}
            </span>
            {data.archivedAt && (
              <Badge color="gray" variant="outline">
                Archived
              </Badge>
            )}
            {!owner && (
              <Badge color="gray" variant="soft">
                {data.ownerName}'s class · read only
              </Badge>
            )}
          </Flex>
        }
      />
      <Flex gap="3" wrap="wrap" align="center">
        {owner && <ImportRosterDialog onImport={(input) => m.importRoster.mutateAsync(input)} />}
        {owner && (
          <Button variant="soft" color="gray" loading={m.setArchived.isPending} onClick={() => m.setArchived.mutate(!data.archivedAt)}>
            {data.archivedAt ? 'Unarchive class' : 'Archive class'}
          </Button>
        )}
        {data.access !== 'admin' && !data.archivedAt && (
          // Only the class's teacher or a co-teacher runs a session for it (the server checks too).
          <Button asChild variant="soft">
            <Link to={routes.sessionNew.build({ classId })}>New session for this class</Link>
          </Button>
        )}
        <Button asChild variant="soft" color="gray">
          <Link to={routes.classTrends.build(classId)}>Trends by tag</Link>
        </Button>
        <Button asChild variant="ghost" color="gray">
          <Link to={routes.classes.build()}>All classes</Link>
        </Button>
      </Flex>
      <FormErrorCallout message={m.setArchived.error?.message ?? m.removeEntry.error?.message ?? m.removePair.error?.message ?? m.removeCoTeacher.error?.message} />

      <section aria-labelledby="roster-heading">
        <Flex direction="column" gap="4">
          <Heading as="h2" size="5" id="roster-heading">
            Roster
          </Heading>
          <RosterPrivacyNote />
          <Tabs.Root defaultValue="table">
            <Tabs.List>
              <Tabs.Trigger value="table">Table</Tabs.Trigger>
              <Tabs.Trigger value="seats">Seat map</Tabs.Trigger>
            </Tabs.List>
            <Tabs.Content value="table">
              <Flex direction="column" gap="4" pt="4">
                {data.roster.length === 0 ? (
                  <EmptyState title="No students yet">Add students one by one below, or import a roster CSV.</EmptyState>
                ) : (
                  <RosterTable
                    roster={data.roster}
                    canEdit={owner}
                    saving={m.updateEntry.isPending}
                    saveError={m.updateEntry.error}
                    onSave={(entryId, input, done) => m.updateEntry.mutate({ entryId, ...input }, { onSuccess: done })}
                    onRemove={(entry) => m.removeEntry.mutate(entry.id)}
                  />
                )}
                {owner && (
                  <Card size="2">
                    <AddRosterEntryForm
                      pending={m.addEntry.isPending}
                      error={m.addEntry.error}
                      onAdd={(input, done) => m.addEntry.mutate(input, { onSuccess: done })}
                    />
                  </Card>
                )}
              </Flex>
            </Tabs.Content>
            <Tabs.Content value="seats">
              <Flex direction="column" gap="3" pt="4">
                <Text size="2" color="gray">
                  Each card is one table. Teams are mixed across tables.
                </Text>
                <SeatMap roster={data.roster} />
              </Flex>
            </Tabs.Content>
          </Tabs.Root>
        </Flex>
      </section>

      <Card size="3" asChild>
        <section aria-labelledby="pairs-heading">
          <Flex direction="column" gap="3">
            <Heading as="h2" size="4" id="pairs-heading">
              Keep apart / keep together
            </Heading>
            <PairRulesCard
              roster={data.roster}
              pairs={data.pairs}
              canEdit={owner}
              pending={m.addPair.isPending}
              error={m.addPair.error}
              onAdd={(input, done) => m.addPair.mutate(input, { onSuccess: done })}
              onRemove={(pair) => m.removePair.mutate(pair.id)}
            />
          </Flex>
        </section>
      </Card>

      <Card size="3" asChild>
        <section aria-labelledby="coteachers-heading">
          <Flex direction="column" gap="3">
            <Heading as="h2" size="4" id="coteachers-heading">
              Co-teachers
            </Heading>
            <CoTeachersCard
              coTeachers={data.coTeachers}
              canEdit={owner}
              pending={m.addCoTeacher.isPending}
              error={m.addCoTeacher.error}
              onAdd={(email, done) => m.addCoTeacher.mutate(email, { onSuccess: done })}
              onRemove={(c) => m.removeCoTeacher.mutate(c.userId)}
            />
          </Flex>
        </section>
      </Card>

      {owner && (
        <Card size="3" asChild>
          <section aria-labelledby="details-heading">
            <Flex direction="column" gap="3">
              <Heading as="h2" size="4" id="details-heading">
                Class details
              </Heading>
              <ClassDetailsForm
                key={data.id}
                cls={data}
                pending={m.update.isPending}
                saved={m.update.isSuccess}
                error={m.update.error}
                onSave={(input) => m.update.mutate(input)}
              />
            </Flex>
          </section>
        </Card>
      )}
    </Flex>
  );
}
