const KEYS = [
  ['N', 'next / open round'],
  ['P', 'pause / resume'],
  ['R', 'reveal'],
  ['C', 'close'],
  ['T', '+15 s'],
] as const;

/** A small reminder of the host screen's keys. */
export function KeyboardLegend() {
  return (
    <ul className="host-legend" aria-label="Keyboard shortcuts">
      {KEYS.map(([key, what]) => (
        <li key={key}>
          <kbd>{key}</kbd>
          {what}
        </li>
      ))}
    </ul>
  );
}
