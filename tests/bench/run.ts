/**
 * Benchmarks: `npx tsx tests/bench/run.ts [filter]` (or `npm run bench`). Every file listed in SECTION_FILES (in ./sections) exports
 * `section: BenchSection`; sections run one after another in the order of SECTION_FILES and print one table, with the
 * reference figures measured in the same process. A filter runs only the sections whose name contains it.
 */
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { printTable } from './helpers/table';
import type { BenchSection, Row } from './helpers/types';

/** The sections in run order (cheap in-process ones first, then those that need the database). */
const SECTION_FILES = ['eaton.ts', 'trajectory.ts', 'kriging.ts', 'imports.ts', 'tiles.ts'];

async function main(): Promise<void> {
  const filter = process.argv[2]?.toLowerCase();
  const dir = join(dirname(fileURLToPath(import.meta.url)), 'sections');
  const results: { name: string; rows: Row[] }[] = [];
  const started = performance.now();
  for (const file of SECTION_FILES) {
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
