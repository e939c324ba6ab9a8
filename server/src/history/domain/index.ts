export { meanOfFigures, NO_PERCENT_REASON } from './mean-figure';
