// Plain-text tables with padded columns, for terminal output.
export function table(rows: string[][], indent = '  '): string {
  const widths: number[] = [];
  for (const r of rows)
    r.forEach((cell, i) => {
      widths[i] = Math.max(widths[i] ?? 0, cell.length);
    });
  return rows
    .map(
      (r) =>
        indent +
        r
          .map((cell, i) => (i === r.length - 1 ? cell : cell.padEnd(widths[i] + 2)))
          .join('')
          .trimEnd(),
    )
    .join('\n');
}
