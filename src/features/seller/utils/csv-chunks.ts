import Papa from 'papaparse';

/**
 * Splits a CSV into smaller CSVs of `size` data rows, each with the header row, so a large import goes up in
 * several requests and the seller sees real progress. `firstRow` is the spreadsheet row number of each chunk's
 * first data row (the header is row 1), to report errors against the seller's own file.
 */
export function chunkCsv(csv: string, size: number): Array<{ csv: string; firstRow: number; rows: number }> {
  const text = csv.replace(/^\uFEFF/, '');
  const parsed = Papa.parse<string[]>(text, { skipEmptyLines: 'greedy' });
  const [header, ...rows] = parsed.data;
  if (!header) return [];
  const out: Array<{ csv: string; firstRow: number; rows: number }> = [];
  for (let i = 0; i < rows.length; i += size) {
    const part = rows.slice(i, i + size);
    out.push({ csv: Papa.unparse({ fields: header, data: part }, { newline: '\r\n' }) + '\r\n', firstRow: i + 2, rows: part.length });
  }
  return out;
}
