import 'reflect-metadata';
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { repositoryRoot } from '../common/repo-paths';
import { BENCHMARKS, BenchRow } from './benchmarks';

/**
 * `npm run bench`: runs every benchmark, prints one table of figure, value and target, and writes
 * it as JSON to `.data/bench/results.json`. Speed targets are measured here, never asserted in tests.
 */
async function main(): Promise<void> {
  const rows: BenchRow[] = [];
  // `npm run bench -- probes`: only the benchmarks whose name contains one of the words given.
  const only = process.argv.slice(2).map((word) => word.toLowerCase());
  const chosen = only.length === 0 ? BENCHMARKS : BENCHMARKS.filter((b) => only.some((word) => b.name.toLowerCase().includes(word)));
  for (const benchmark of chosen) {
    process.stdout.write(`running ${benchmark.name} ...\n`);
    try {
      rows.push(...(await benchmark.run()));
    } catch (error) {
      rows.push({ figure: benchmark.name, value: 'failed', target: '-', met: false, note: error instanceof Error ? error.message : String(error) });
    }
  }
  const width = (key: keyof BenchRow) => Math.max(key.length, ...rows.map((r) => String(r[key] ?? '').length));
  const columns: (keyof BenchRow)[] = ['figure', 'value', 'target', 'met'];
  const line = (cells: string[]) => cells.map((c, i) => c.padEnd(width(columns[i]))).join('  ');
  console.log('');
  console.log(line(columns.map(String)));
  console.log(line(columns.map((c) => '-'.repeat(width(c)))));
  for (const row of rows) console.log(line([row.figure, String(row.value), row.target, row.met ? 'yes' : 'NO']));
  const dir = join(repositoryRoot(), '.data', 'bench');
  mkdirSync(dir, { recursive: true });
  const file = join(dir, 'results.json');
  writeFileSync(file, JSON.stringify({ at: new Date().toISOString(), rows }, null, 2));
  console.log(`\nwritten to ${file}`);
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
