// `npx tsx server/bin/writeDemoFixtures.ts` rewrites tests/fixtures/demo/ from the demo seed (after a change to the generator).
import { writeDemoFixtures } from '../db/seed/demoBasin/fixtures';

for (const path of writeDemoFixtures()) console.log(`[porelith] wrote ${path}`);
