import { Button, Card, Flex, Heading, Text } from '@radix-ui/themes';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { countText } from '@/features/forms/utils/countText';
import { useSchoolSettings } from '../hooks/useSchoolSettings';
import { RetentionForm } from './RetentionForm';

/** How long the school keeps nicknames and responses (DESIGN.md §9: retention under the school's control). */
export function PlayerDataCard() {
  const school = useSchoolSettings();

  return (
    <Card size="3" asChild>
      <section aria-labelledby="player-data-heading">
        <Flex direction="column" gap="4">
          <Heading as="h2" size="4" id="player-data-heading">
            Player data
          </Heading>
          {school.isPending && <Text color="gray">Loading the school's settings…</Text>}
          {school.isError && (
            <Flex direction="column" gap="3" align="start">
              <FormErrorCallout message={school.error.message} />
              <Button variant="soft" onClick={() => void school.refetch()}>
                Try again
              </Button>
            </Flex>
          )}
          {school.isSuccess && (
            <>
              <Text as="p">
                Player data is kept for {countText(school.data.retentionDays, 'day')} after a session ends. A daily job then deletes
                the nicknames and responses; the sessions stay, and their debriefs count those students as removed.
              </Text>
              <RetentionForm settings={school.data} />
            </>
          )}
          <Text as="p" size="2" color="gray">
            Follow your school's policy and the student-privacy law that applies to you. Deletion is permanent: deleted data
            cannot be recovered.
          </Text>
        </Flex>
      </section>
    </Card>
  );
}
