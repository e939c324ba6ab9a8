import {
  DebriefInput,
  DebriefInputError,
  DebriefItem,
  DebriefResponse,
} from './debrief-input';

/** One present examinee's row: credit, answered flag and chosen options per item, in item order. */
export interface ExamineeRow {
  examineeId: string;
  credits: number[];
  answered: boolean[];
  chosen: string[][];
  total: number;
}

/** The validated response matrix over present (non-removed) examinees × items. */
export interface ResponseMatrix {
  items: DebriefItem[];
  rows: ExamineeRow[];
  removedCount: number;
  presentIds: ReadonlySet<string>;
}

function assertUnique(ids: readonly string[], what: string): void {
  const seen = new Set<string>();
  for (const id of ids) {
    if (seen.has(id)) throw new DebriefInputError(`duplicate ${what} id "${id}"`);
    seen.add(id);
  }
}

function assertItem(item: DebriefItem): void {
  assertUnique(item.optionIds, `option (item "${item.id}")`);
  const options = new Set(item.optionIds);
  for (const key of item.correctOptionIds) {
    if (!options.has(key)) {
      throw new DebriefInputError(`item "${item.id}": key "${key}" is not one of its options`);
    }
  }
}

function assertResponse(response: DebriefResponse, item: DebriefItem): void {
  const { credit } = response;
  const where = `response of "${response.examineeId}" to "${item.id}"`;
  if (!Number.isFinite(credit) || credit < 0 || credit > 1) {
    throw new DebriefInputError(`${where}: credit ${credit} is outside 0..1`);
  }
  if (item.dichotomous && credit !== 0 && credit !== 1) {
    throw new DebriefInputError(`${where}: dichotomous item with credit ${credit}`);
  }
  if (!response.answered && (credit !== 0 || response.chosenOptionIds.length > 0)) {
    throw new DebriefInputError(`${where}: not answered but has credit or choices`);
  }
  const options = new Set(item.optionIds);
  for (const optionId of response.chosenOptionIds) {
    if (!options.has(optionId)) {
      throw new DebriefInputError(`${where}: unknown option "${optionId}"`);
    }
  }
}

export function buildResponseMatrix(input: DebriefInput): ResponseMatrix {
  assertUnique(input.items.map((item) => item.id), 'item');
  assertUnique(input.examinees.map((examinee) => examinee.id), 'examinee');
  input.items.forEach(assertItem);

  const itemIndex = new Map(input.items.map((item, index) => [item.id, index]));
  const removed = new Set(input.examinees.filter((e) => e.removed === true).map((e) => e.id));
  const present = input.examinees.filter((e) => e.removed !== true);
  const rowIndex = new Map(present.map((examinee, index) => [examinee.id, index]));
  const itemCount = input.items.length;
  const rows: ExamineeRow[] = present.map((examinee) => ({
    examineeId: examinee.id,
    credits: new Array<number>(itemCount).fill(0),
    answered: new Array<boolean>(itemCount).fill(false),
    chosen: Array.from({ length: itemCount }, () => [] as string[]),
    total: 0,
  }));

  const seen = new Set<string>();
  for (const response of input.responses) {
    const i = itemIndex.get(response.itemId);
    if (i === undefined) throw new DebriefInputError(`response to unknown item "${response.itemId}"`);
    if (removed.has(response.examineeId)) continue; // deleted on request: leaves no trace
    const r = rowIndex.get(response.examineeId);
    if (r === undefined) {
      throw new DebriefInputError(`response from unknown examinee "${response.examineeId}"`);
    }
    // JSON of the pair cannot collide the way a joined string could.
    const pair = JSON.stringify([response.examineeId, response.itemId]);
    if (seen.has(pair)) {
      throw new DebriefInputError(
        `duplicate response of "${response.examineeId}" to "${response.itemId}"`,
      );
    }
    seen.add(pair);
    assertResponse(response, input.items[i]);
    rows[r].credits[i] = response.credit;
    rows[r].answered[i] = response.answered;
    rows[r].chosen[i] = [...new Set(response.chosenOptionIds)];
  }
  for (const row of rows) row.total = row.credits.reduce((acc, credit) => acc + credit, 0);

  return {
    items: input.items,
    rows,
    removedCount: removed.size,
    presentIds: new Set(rowIndex.keys()),
  };
}

/** Column i of the matrix: every present examinee's credit on item i. */
export function itemCredits(matrix: ResponseMatrix, itemIndex: number): number[] {
  return matrix.rows.map((row) => row.credits[itemIndex]);
}
