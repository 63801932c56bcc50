/**
 * Benchmarks: `npx tsx tests/bench/run.ts [filter]` (or `npm run bench`). Every file in ./sections exports
 * `section: BenchSection`; sections run one after another in file-name order and print one table, with the
 * reference figures measured in the same process. A filter runs only the sections whose name contains it.
 */
import { readdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { printTable } from './helpers/table';
import type { BenchSection, Row } from './helpers/types';

async function main(): Promise<void> {
  const filter = process.argv[2]?.toLowerCase();
  const dir = join(dirname(fileURLToPath(import.meta.url)), 'sections');
  const files = readdirSync(dir)
    .filter((f) => f.endsWith('.ts'))
    .sort();
  const results: { name: string; rows: Row[] }[] = [];
  const started = performance.now();
  for (const file of files) {
    const mod = (await import(pathToFileURL(join(dir, file)).href)) as { section?: BenchSection };
    const section = mod.section;
    if (!section) throw new Error(`${file} does not export a \`section\``);
    if (filter && !section.name.toLowerCase().includes(filter)) continue;
    const t0 = performance.now();
    const rows = await section.run();
    console.error(`${section.name}: ${((performance.now() - t0) / 1000).toFixed(1)} s`);
    results.push({ name: section.name, rows });
  }
  console.log(`\nPorelith benchmarks — Node ${process.version}, ${new Date().toISOString()}`);
  printTable(results);
  console.log(`\ntotal ${((performance.now() - started) / 1000).toFixed(1)} s`);
}

main().catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});
