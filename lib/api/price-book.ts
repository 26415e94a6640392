import {
  priceBookSchema,
  priceImportResultSchema,
  priceItemSchema,
  type PriceSetBody,
} from '@/shared/schemas/price-book';
import { apiRequest } from './client';

/** The firm's price book: read, set one price, import a CSV file. */

export const fetchPriceBook = () => apiRequest('GET', '/api/price-book', priceBookSchema);

export const setPrice = (body: PriceSetBody) =>
  apiRequest('POST', '/api/price-book/items', priceItemSchema, body);

export const importPrices = (csv: string) =>
  apiRequest('POST', '/api/price-book/import', priceImportResultSchema, { csv });

/** Where the browser downloads the price book as CSV. */
export const PRICE_BOOK_CSV_PATH = '/api/price-book/export.csv';
