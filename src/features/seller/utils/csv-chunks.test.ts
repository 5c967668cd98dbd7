import { describe, expect, it } from 'vitest';
import { chunkCsv } from './csv-chunks';

describe('chunkCsv', () => {
  it('when a CSV has more rows than a chunk, then each chunk repeats the header and knows its first row number', () => {
    const csv = '\uFEFFtitle,price\r\n"Clamp, hose",1.00\r\nPin,0.25\r\nKey 606,0.90\r\n\r\n';
    const chunks = chunkCsv(csv, 2);
    expect(chunks).toHaveLength(2);
    expect(chunks[0]).toEqual({ csv: 'title,price\r\n"Clamp, hose",1.00\r\nPin,0.25\r\n', firstRow: 2, rows: 2 });
    expect(chunks[1]).toEqual({ csv: 'title,price\r\nKey 606,0.90\r\n', firstRow: 4, rows: 1 });
  });

  it('when the CSV has only a header, then there is nothing to send', () => {
    expect(chunkCsv('title,price\n', 10)).toEqual([]);
  });
});
