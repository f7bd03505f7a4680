// CSV as RFC 4180 describes it: CRLF line ends, fields containing a comma, double quote or line
// break are wrapped in double quotes, and a double quote inside is doubled.

// A cell that a spreadsheet would run as a formula (=, +, -, @, tab, carriage return first) is
// prefixed with an apostrophe — the OWASP "CSV injection" advice (common practice).
const FORMULA_START = /^[=+\-@\t\r]/;

export function csvField(value: string | number | null | undefined): string {
  if (value === null || value === undefined) return "";
  let text = String(value);
  if (typeof value === "string" && FORMULA_START.test(text)) text = `'${text}`;
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

export function toCsv(header: readonly string[], rows: readonly (readonly (string | number | null | undefined)[])[]): string {
  return [header, ...rows].map((r) => r.map(csvField).join(",")).join("\r\n") + "\r\n";
}
