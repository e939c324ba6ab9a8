import { NOT_ENOUGH_DATA, type DebriefDto, type FigureDto } from '@covalent/shared-types';

export interface DebriefEmail {
  subject: string;
  text: string;
  html: string;
}

const escapeHtml = (s: string): string =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] as string);

const percent = (f: FigureDto): string => (f.value === null ? NOT_ENOUGH_DATA : `${Math.round(f.value * 100)}%`);
const decimal = (f: FigureDto): string => (f.value === null ? NOT_ENOUGH_DATA : f.value.toFixed(2));

function summaryRows(d: DebriefDto): [string, string][] {
  const method = d.reliability.method === 'kr20' ? 'KR-20' : "Cronbach's alpha";
  return [
    ['Bank', d.bankTitle],
    ['Class', d.className ?? 'No class'],
    ['Format', d.format + (d.unit === 'team' ? ' (figures per team submission)' : '')],
    ['Played', d.playedAt.slice(0, 16).replace('T', ' ') + ' UTC'],
    ['Students', String(d.playerCount) + (d.removedCount ? ` (${d.removedCount} removed)` : '')],
    ['Items', String(d.itemCount)],
    ['Class accuracy', percent(d.classAccuracy)],
    [`Reliability (${method})`, decimal(d.reliability.value)],
    ['Standard error of measurement', decimal(d.reliability.sem)],
  ];
}

/**
 * The debrief as an e-mail: a summary table and the items to revisit with their keys.
 * No student names in the body; they are in the attached gradebook CSV only.
 */
export function debriefEmail(d: DebriefDto): DebriefEmail {
  const revisit = d.items.filter((i) => i.revisit);
  const subject = `Debrief: ${d.bankTitle}${d.className ? ` — ${d.className}` : ''} (${d.playedAt.slice(0, 10)})`;
  const rows = summaryRows(d);
  const text = [
    subject,
    '',
    ...rows.map(([k, v]) => `${k}: ${v}`),
    '',
    revisit.length ? 'Items to revisit:' : 'No items to revisit.',
    ...revisit.map((i) => `${i.position + 1}. ${i.prompt} — p ${decimal(i.p)}; key: ${i.keyText}`),
    '',
    'The gradebook CSV is attached. Games are for practice and review, not for high-stakes grading.',
  ].join('\n');
  const html = [
    `<h1>${escapeHtml(subject)}</h1>`,
    '<table>',
    ...rows.map(([k, v]) => `<tr><th scope="row" align="left">${escapeHtml(k)}</th><td>${escapeHtml(v)}</td></tr>`),
    '</table>',
    revisit.length ? '<h2>Items to revisit</h2>' : '<p>No items to revisit.</p>',
    revisit.length
      ? `<table><thead><tr><th>#</th><th>Item</th><th>p</th><th>Key</th></tr></thead><tbody>${revisit
          .map((i) => `<tr><td>${i.position + 1}</td><td>${escapeHtml(i.prompt)}</td><td>${decimal(i.p)}</td><td>${escapeHtml(i.keyText)}</td></tr>`)
          .join('')}</tbody></table>`
      : '',
    '<p>The gradebook CSV is attached. Games are for practice and review, not for high-stakes grading.</p>',
  ].join('\n');
  return { subject, text, html };
}
