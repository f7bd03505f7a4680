/**
 * A statement file (or one row of it) that cannot be read. `row` is the 1-based line of the
 * file where the offending record or element starts, as a text editor numbers it; `column` is
 * the mapped column or OFX element that failed, when one did.
 */
export class ReconcileParseError extends Error {
  readonly row: number;
  readonly column?: string;

  constructor(message: string, where: { row: number; column?: string | number }) {
    const column = where.column === undefined ? undefined : String(where.column);
    super(`Row ${where.row}${column === undefined ? "" : `, column ${column}`}: ${message}`);
    this.name = "ReconcileParseError";
    this.row = where.row;
    if (column !== undefined) this.column = column;
  }
}
