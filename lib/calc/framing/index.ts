export { buildFramingList, type FramingLine, type FramingList } from '@/lib/calc/framing/framing-list';
export { pickStock, type StockPick } from '@/lib/calc/framing/stock';
export { PLATE_THICKNESS_IN, PRECUT_STUDS, SAW_KERF_IN, STOCK_LENGTHS_FT } from '@/lib/calc/framing/lumber';
