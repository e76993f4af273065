export {
  formatDate,
  formatClock,
  formatClockRange,
  formatDateTime,
  formatMoment,
  formatPieces,
  plural,
} from '@fryline/ui/format';
