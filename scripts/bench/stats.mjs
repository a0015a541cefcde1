/** Percentiles of a list of latencies (ms), nearest-rank. */
export function percentiles(values) {
  const sorted = [...values].sort((a, b) => a - b);
  const at = (p) => (sorted.length ? sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)] : null);
  return { p50: at(50), p95: at(95), p99: at(99) };
}

export function round(n, digits = 2) {
  return n === null || n === undefined ? null : Math.round(n * 10 ** digits) / 10 ** digits;
}

/** Prints rows as an aligned table. */
export function printTable(rows) {
  const headers = Object.keys(rows[0] ?? {});
  const cells = rows.map((r) => headers.map((h) => String(r[h] ?? "")));
  const widths = headers.map((h, i) => Math.max(h.length, ...cells.map((c) => c[i].length)));
  const line = (values) => values.map((v, i) => v.padEnd(widths[i])).join("  ");
  console.log(line(headers));
  console.log(widths.map((w) => "-".repeat(w)).join("  "));
  for (const c of cells) console.log(line(c));
}
