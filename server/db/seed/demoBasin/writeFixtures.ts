// Script entry: `npx tsx server/db/seed/demoBasin/writeFixtures.ts` rewrites tests/fixtures/demo/ from the seed.
import { writeDemoFixtures } from './fixtures';

for (const path of writeDemoFixtures()) console.log(`[porelith] wrote ${path}`);
