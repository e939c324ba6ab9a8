import { Callout } from '@radix-ui/themes';

/** DESIGN.md §9, said calmly where lab-safety items are written. */
export function SafetyCaution() {
  return (
    <Callout.Root color="gray" variant="surface" role="note">
      <Callout.Text>
        These lab-safety items support your school's safety training, its chemical hygiene plan and your own professional
        judgement; they never replace them. Local rules govern.
      </Callout.Text>
    </Callout.Root>
  );
}
