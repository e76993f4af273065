export {
  formatDate,
  formatClock,
  formatClockRange,
  formatMoment,
  formatDateTime,
  plural,
  listWords,
  formatPieces,
} from '@fryline/ui/format';
export { formatCents } from '@fryline/schemas';
