export { meanOfFigures, NO_PERCENT_REASON, type HistoryFigure } from './mean-figure';
