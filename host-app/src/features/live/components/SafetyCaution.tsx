import { Callout } from '@radix-ui/themes';

/** DESIGN.md §9: shown whenever the bank or the item on screen is about lab safety. */
export function SafetyCaution() {
  return (
    <Callout.Root color="amber" variant="surface" size="1" className="host-safety">
      <Callout.Text>
        Lab-safety items support, and never replace, the school's safety training, its chemical hygiene plan and the
        teacher's judgement. Local rules govern.
      </Callout.Text>
    </Callout.Root>
  );
}
