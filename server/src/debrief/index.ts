export { DebriefModule } from './debrief.module';
export { DebriefService, type CsvExport } from './debrief.service';
export { buildDebrief, buildDebriefInput, needsRevisit, summaryDto, unitOf, DATA_DELETED_REASON } from './debrief-builder';
export type { DebriefSource, SourcePlayer, SourceResponse, SourceTeamRound } from './debrief-source';
export { keyText, responseText } from './answer-text';
export { GRADEBOOK_COLUMNS, ITEM_ANALYSIS_COLUMNS, exportFileName, gradebookCsv, itemAnalysisCsv, textCell } from './exports/debrief-csv';
export { debriefEmail, type DebriefEmail } from './exports/debrief-email';
export { DELETED_NICKNAME, DELETED_NICKNAME_KEY_PREFIX, isDeletedNicknameKey } from './player-data';
