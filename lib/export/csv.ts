// CSV files for spreadsheets (RFC 4180: comma separated, CRLF line ends,
// fields quoted when they hold a comma, quote or line break; quotes doubled).
// A cell that a spreadsheet would run as a formula gets a leading apostrophe
// (OWASP "CSV injection").
export type CsvValue = string | number | boolean | null | undefined;

export function csvCell(v: CsvValue): string {
  if (v == null) return "";
  let s = String(v);
  if (typeof v === "string" && /^[=+\-@\t\r]/.test(s)) s = `'${s}`;
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

export function toCsv<T>(rows: T[], columns: [header: string, value: (row: T) => CsvValue][]): string {
  const lines = [columns.map(([h]) => csvCell(h)).join(",")];
  for (const r of rows) lines.push(columns.map(([, f]) => csvCell(f(r))).join(","));
  return lines.join("\r\n") + "\r\n";
}
