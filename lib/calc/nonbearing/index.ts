export {
  nonbearingHeader,
  FLAT_HEADER_MAX_NAILING_GAP_IN,
  FLAT_HEADER_MAX_OPENING_IN,
  type NonbearingHeaderResult,
  type NonbearingVerdict,
} from '@/lib/calc/nonbearing/nonbearing-header';
