import { parse } from 'csv-parse/sync';
import { buildDebrief } from '../debrief-builder';
import { w10Source } from '../debrief.factories';
import { debriefEmail } from './debrief-email';
import { GRADEBOOK_COLUMNS, exportFileName, gradebookCsv, itemAnalysisCsv, textCell } from './debrief-csv';

const records = (csv: string) => parse(csv.replace(/^\uFEFF/, ''), { columns: true }) as Record<string, string>[];

describe('gradebookCsv', () => {
  it('starts with a UTF-8 BOM and has one row per student with W10 totals (Wuensch, KR20.txt)', () => {
    const csv = gradebookCsv(buildDebrief(w10Source()).dto);
    expect(csv.startsWith('\uFEFF')).toBe(true);
    expect(csv.split('\n')[0]).toBe('\uFEFF' + GRADEBOOK_COLUMNS.join(','));
    const rows = records(csv);
    expect(rows.find((r) => r.nickname === 'Nick F')).toEqual({
      student: 'Nick F',
      nickname: 'Nick F',
      score: '9.00',
      max_score: '10',
      percent: '90.0',
      items_answered: '10',
    });
    expect(rows).toHaveLength(10);
  });

  it('leaves removed students out', () => {
    const source = w10Source();
    source.players[0].deleted = true;
    source.responses = source.responses.filter((r) => r.playerId !== source.players[0].id);
    expect(records(gradebookCsv(buildDebrief(source).dto))).toHaveLength(9);
  });
});

describe('itemAnalysisCsv', () => {
  it('has p, D, r_pb, flags and option shares per item', () => {
    const { dto } = buildDebrief(w10Source());
    const rows = records(itemAnalysisCsv(dto));
    expect(rows).toHaveLength(10);
    // W10 Q9: p = .5 (Wuensch); shares A .5, B .5, C 0.
    expect(rows[8]).toMatchObject({ position: '9', p: '0.500', key: 'B', option_A: '0.500', option_B: '0.500', option_C: '0.000', option_D: '' });
    expect(rows[8].D).toBe(dto.items[8].D.value?.toFixed(3));
    expect(rows[8].r_pb).toBe(dto.items[8].pointBiserial.value?.toFixed(3));
  });
});

describe('textCell', () => {
  it('defuses text a spreadsheet would run as a formula (OWASP "CSV Injection")', () => {
    expect(textCell('=HYPERLINK("x")')).toBe('\'=HYPERLINK("x")');
    expect(textCell('@SUM(A1)')).toBe("'@SUM(A1)");
    expect(textCell('Mateo R.')).toBe('Mateo R.');
  });
});

describe('exportFileName', () => {
  it('is ASCII with the bank, the date and the kind', () => {
    expect(exportFileName(buildDebrief(w10Source()).dto, 'gradebook')).toBe('lab-entry-exit-procedures-2025-09-08-gradebook.csv');
  });
});

describe('debriefEmail', () => {
  it('lists the items to revisit (p < 0.70) with their keys and escapes HTML', () => {
    const source = w10Source();
    source.items[8] = { ...source.items[8], prompt: 'Is <b>this</b> safe?' };
    const mail = debriefEmail(buildDebrief(source).dto);
    // W10 items with p < .7: Q3 .6, Q5 .6, Q9 .5, Q10 .6.
    expect(mail.text).toMatch(/Items to revisit:\n3\. .*\n5\. .*\n9\. .*\n10\. /);
    expect(mail.html).toContain('Is &lt;b&gt;this&lt;/b&gt; safe?');
    expect(mail.html).not.toContain('<b>this</b>');
    expect(mail.subject).toBe('Debrief: Lab entry & exit procedures (2025-09-08)');
  });
});
