/** True when any tag marks lab-safety content ("safety", "lab-safety", "Lab safety"…). */
export function isSafetyTagged(tags: readonly string[]): boolean {
  return tags.some((tag) => /\bsafety\b/i.test(tag.replace(/[-_]/g, ' ')));
}
