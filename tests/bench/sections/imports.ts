/**
 * Imports: 10,000 well headers, then 200,000 pressure rows and 200,000 survey stations over them,
 * through the same service the API uses (parse, check, plan, one transaction). The reference is the
 * floor: the same SI rows sent by pg alone as one INSERT … SELECT unnest(…) per table.
 */
import { randomUUID } from 'node:crypto';
import { sql } from 'drizzle-orm';
import type { BenchSection, Row } from '../helpers/types';

const WELLS = 10_000;
const PRESSURES = 200_000;
const STATIONS_PER_WELL = 20;

export const section: BenchSection = {
  name: 'imports',
  async run(): Promise<Row[]> {
    if (!process.env.DATABASE_URL) return [{ metric: 'skipped: run through `npm run bench` (needs a database)', ours: NaN, unit: '' }];
    const { createDb } = await import('../../../server/db/client');
    const { teams, users } = await import('../../../server/db/schema');
    const { runImport } = await import('../../../server/features/imports/imports.service');
    const db = createDb(process.env.DATABASE_URL, 2);
    const [team] = await db
      .insert(teams)
      .values({ name: `bench ${randomUUID()}` })
      .returning();
    const [user] = await db
      .insert(users)
      .values({ email: `bench-${randomUUID()}@porelith.example`, name: 'bench' })
      .returning();
    const base = { teamId: team.id, userId: user.id, epsg: 4326, dryRun: false, skipInvalid: false };
    try {
      const header = ['name,uwi,lon,lat,water depth (m),td md (m)'];
      for (let i = 0; i < WELLS; i++)
        header.push(
          `BW-${i},BU-${i},${(-101 + (i % 100) * 0.01).toFixed(4)},${(-32 - Math.floor(i / 100) * 0.005).toFixed(4)},${100 + (i % 50)},${3000 + (i % 900)}`,
        );
      const wellsCsv = Buffer.from(header.join('\n'));
      const t0 = performance.now();
      const w = await runImport(db, { ...base, kind: 'wells', fileName: 'bench-wells.csv', bytes: wellsCsv });
      const wellsMs = performance.now() - t0;

      const survey = ['well,md (m),inc,azi'];
      for (let i = 0; i < WELLS; i++)
        for (let k = 0; k < STATIONS_PER_WELL; k++) survey.push(`BW-${i},${k * 150},${Math.min(40, k * 3)},${(i * 7) % 360}`);
      const t1 = performance.now();
      await runImport(db, { ...base, kind: 'surveys', fileName: 'bench-survey.csv', bytes: Buffer.from(survey.join('\n')) });
      const surveyMs = performance.now() - t1;

      const pressures = ['well,kind,md (m),value,unit,quality'];
      for (let i = 0; i < PRESSURES; i++)
        pressures.push(`BW-${i % WELLS},formation_test,${1000 + (i % 20) * 100},${(1500 + (i % 20) * 150).toFixed(1)},psi,good`);
      const t2 = performance.now();
      await runImport(db, { ...base, kind: 'pressures', fileName: 'bench-pressures.csv', bytes: Buffer.from(pressures.join('\n')) });
      const pressureMs = performance.now() - t2;

      // The floor: the same number of pressure rows inserted by PostgreSQL from arrays, no parsing or checks.
      const ids = (await db.execute<{ id: string }>(sql`SELECT id FROM wells WHERE team_id = ${team.id} ORDER BY name`)).rows.map(
        (r) => r.id,
      );
      const wellIds = Array.from({ length: PRESSURES }, (_, i) => ids[i % ids.length]);
      const md = Array.from({ length: PRESSURES }, (_, i) => 1000 + (i % 20) * 100);
      const t3 = performance.now();
      await db.$client.query(
        `INSERT INTO pressure_observations (well_id, kind, md_m, tvd_m, value_entered, unit_entered, pressure_pa, emw_kg_m_3)
         SELECT w, 'formation_test', m, m, 1, 'psi', m * 10000, 1000 FROM unnest($1::uuid[], $2::float8[]) AS t(w, m)`,
        [wellIds, md],
      );
      const rawMs = performance.now() - t3;
      return [
        {
          metric: `${WELLS.toLocaleString('en')} well headers (${(w as { outcome?: { created: number } }).outcome?.created ?? 0} created)`,
          ours: wellsMs,
          unit: 'ms',
        },
        {
          metric: `${(WELLS * STATIONS_PER_WELL).toLocaleString('en')} survey stations with minimum curvature`,
          ours: surveyMs,
          unit: 'ms',
        },
        {
          metric: `${PRESSURES.toLocaleString('en')} pressure rows`,
          ours: pressureMs,
          reference: rawMs,
          unit: 'ms',
          note: 'pg INSERT … unnest of the same rows, no parsing',
        },
      ];
    } finally {
      await db.execute(sql`DELETE FROM wells WHERE team_id = ${team.id}`);
      await db.execute(sql`DELETE FROM uploads WHERE team_id = ${team.id}`);
      await db.execute(sql`DELETE FROM teams WHERE id = ${team.id}`);
      await db.execute(sql`DELETE FROM users WHERE id = ${user.id}`);
      await db.$client.end();
    }
  },
};
