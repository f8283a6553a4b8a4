import Papa from 'papaparse';

export type CsvColumn<Row> = { header: string; value: (row: Row) => string | number | boolean | null | undefined };

/**
 * Rows as RFC 4180 CSV through papaparse. Cells that a spreadsheet would run as a formula
 * (=, +, -, @ at the start) get a leading apostrophe (the OWASP "CSV injection" advice).
 */
export function toCsv<Row>(rows: Row[], columns: CsvColumn<Row>[]): string {
  const data = rows.map((row) => columns.map((column) => guard(column.value(row))));
  return Papa.unparse({ fields: columns.map((column) => column.header), data }, { newline: '\r\n' });
}

function guard(value: string | number | boolean | null | undefined) {
  if (value === null || value === undefined) return '';
  if (typeof value !== 'string') return value;
  return /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
}

/** A CSV download response with a dated file name. */
export function csvResponse(name: string, csv: string) {
  const stamp = new Date().toISOString().slice(0, 10);
  return new Response(`\uFEFF${csv}`, {
    headers: {
      'content-type': 'text/csv; charset=utf-8',
      'content-disposition': `attachment; filename="${name}-${stamp}.csv"`,
    },
  });
}
