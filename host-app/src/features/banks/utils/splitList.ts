/** "safety, goggles ,," → ["safety", "goggles"]: a typed list split on `separator`, trimmed, empties dropped. */
export function splitList(text: string, separator: RegExp = /,/): string[] {
  return text
    .split(separator)
    .map((part) => part.trim())
    .filter((part) => part !== '');
}
