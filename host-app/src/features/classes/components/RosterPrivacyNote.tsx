import { Callout } from '@radix-ui/themes';

/** DESIGN.md §9: collect no more than a name the class uses. */
export function RosterPrivacyNote() {
  return (
    <Callout.Root color="gray" variant="surface" role="note">
      <Callout.Text>Use first names or the names students go by; no surnames, IDs or e-mail addresses needed.</Callout.Text>
    </Callout.Root>
  );
}
