/** A reader of RFC 4180 text, written from the grammar in §2 of the RFC, to read back what toCsv wrote. */
export function readCsv(text: string): string[][] {
  const records: string[][] = [];
  let record: string[] = [];
  let field = '';
  let i = 0;
  while (i < text.length) {
    if (text[i] === '"') {
      i += 1;
      while (!(text[i] === '"' && text[i + 1] !== '"')) {
        field += text[i];
        i += text[i] === '"' ? 2 : 1;
      }
      i += 1;
    } else if (text[i] === ',') {
      record.push(field);
      field = '';
      i += 1;
    } else if (text.startsWith('\r\n', i)) {
      record.push(field);
      records.push(record);
      record = [];
      field = '';
      i += 2;
    } else {
      field += text[i];
      i += 1;
    }
  }
  return records;
}
