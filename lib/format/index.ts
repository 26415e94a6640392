export { formatNumber, formatNumberTrimmed, NOT_A_NUMBER_TEXT } from '@/lib/format/number';
export { csvField, toCsv } from '@/lib/format/csv';
export { formatFtIn, formatIn, formatSpanFtIn } from '@/lib/format/ft-in';
export { formatLb, formatPlf, formatPsf, formatPsi, formatRatio } from '@/lib/format/quantities';
