// CSV as RFC 4180 writes it: comma-separated, CRLF line ends, fields quoted when they hold a
// comma, quote or line break, quotes doubled.

/**
 * One CSV line. Text that a spreadsheet would run as a formula (starting with = + - @ or a tab)
 * gets a leading apostrophe, common practice against formula injection; numbers are left alone.
 */
export function csvLine(fields: unknown[]): string {
  return (
    fields
      .map((f) => {
        let s = f === null || f === undefined ? '' : String(f);
        if (typeof f === 'string' && /^[=+\-@\t\r]/.test(s)) s = `'${s}`;
        return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
      })
      .join(',') + '\r\n'
  );
}
