import { Button, Card, Flex, Switch, Text } from '@radix-ui/themes';
import { useState } from 'react';
import { ClassesTable } from '@/features/classes/components/ClassesTable';
import { CreateClassForm } from '@/features/classes/components/CreateClassForm';
import { useClasses } from '@/features/classes/hooks/useClasses';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { EmptyState } from '@/features/shell/components/EmptyState';
import { PageFallback } from '@/features/shell/components/PageFallback';
import { PageHeader } from '@/features/shell/components/PageHeader';

export function ClassesPage() {
  const [showArchived, setShowArchived] = useState(false);
  const classes = useClasses(showArchived ? 'all' : 'false');

  return (
    <Flex direction="column" gap="5">
      <PageHeader title="Classes" description="Class periods with their rosters, table groups and accommodations." />
      <Card size="3">
        <CreateClassForm />
      </Card>
      <Text as="label" size="2">
        <Flex gap="2" align="center">
          <Switch checked={showArchived} onCheckedChange={setShowArchived} />
          Show archived classes
        </Flex>
      </Text>
      {classes.isPending && <PageFallback label="Loading classes…" />}
      {classes.isError && (
        <Flex direction="column" gap="3" align="start">
          <FormErrorCallout message={classes.error.message} />
          <Button variant="soft" onClick={() => void classes.refetch()}>
            Try again
          </Button>
        </Flex>
      )}
      {classes.isSuccess &&
        (classes.data.length === 0 ? (
          <EmptyState title="No classes yet">Add a class to give students a place to join your review sessions.</EmptyState>
        ) : (
          <ClassesTable classes={classes.data} />
        ))}
    </Flex>
  );
}
