import { Callout, Flex, Heading, Text } from '@radix-ui/themes';

/** The product's standing cautions (DESIGN.md §9), said once, plainly. */
export function CautionsCallout() {
  return (
    <section aria-labelledby="cautions-heading">
      <Callout.Root color="gray" variant="surface" size="2">
        <Flex direction="column" gap="3">
          <Heading as="h2" size="3" id="cautions-heading">
            Before you run a session
          </Heading>
          <Text as="p">
            <Text weight="bold">Student privacy.</Text> Students join with a nickname only. Follow your school's policy
            and the student-privacy law that applies to you; your school sets how long results are kept, and deleted
            data is really deleted.
          </Text>
          <Text as="p">
            <Text weight="bold">Practice, not grading.</Text> Sessions are for practice and review. Do not use their
            scores for high-stakes grades.
          </Text>
          <Text as="p">
            <Text weight="bold">Lab safety.</Text> Lab-safety items support your school's safety training, its chemical
            hygiene plan and your own professional judgement; they never replace them. Local rules govern.
          </Text>
        </Flex>
      </Callout.Root>
    </section>
  );
}
