/**
 * The VALUES list of a multi-row insert with bind parameters: `($1, $2), ($3, $4)`
 * for two rows of two columns. Bound values go to the mariadb driver as they
 * are and are escaped straight into its packet, where Sequelize's
 * `replacements` first build an escaped copy of every string into the SQL
 * text; for rows carrying kilobytes of JSON that copy was the largest single
 * allocation of a stored assessment.
 */
export function bindRows(rows: number, columns: number): string {
  const out: string[] = new Array(rows);
  for (let r = 0; r < rows; r++) {
    const cells: string[] = new Array(columns);
    for (let c = 0; c < columns; c++) cells[c] = `$${r * columns + c + 1}`;
    out[r] = `(${cells.join(', ')})`;
  }
  return out.join(', ');
}
