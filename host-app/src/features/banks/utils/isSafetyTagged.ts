/** A lab-safety bank: its title or any tag of the bank or its items mentions safety ("safety", "lab-safety"). */
export function isSafetyTagged(title: string, tagLists: string[][]): boolean {
  return /safety/i.test(title) || tagLists.some((tags) => tags.some((tag) => /safety/i.test(tag)));
}
