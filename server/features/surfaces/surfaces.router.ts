import { Router } from 'express';
import { z } from 'zod';
import { lonLatSchema } from '../../../shared/schemas/planning';
import { surfaceRequestBody } from '../../../shared/schemas/surfaces';
import type { Db } from '../../db/client';
import type { JobRegistry } from '../../lib/jobs';
import { parse } from '../../lib/parse';
import { requireTeam, teamIdOf } from '../../middleware/guards';
import { getPlannedWell } from '../planning/plannedWells.service';
import { createSurface, deleteSurface, getSurface, listSurfaces } from './surfaces.service';
import { valueAt } from './valueAt';

const prospectParams = z.object({ id: z.string().uuid('must be a prospect id') });
const surfaceParams = z.object({ surfaceId: z.string().uuid('must be a surface id') });
const pointQuery = z
  .object({ lon: z.coerce.number(), lat: z.coerce.number() })
  .refine((p) => lonLatSchema.safeParse([p.lon, p.lat]).success, 'lon must be within −180..180 and lat within −90..90');
const asyncQuery = z.object({ async: z.enum(['true', 'false']).optional() });

export function surfacesRouter(db: Db, jobs: JobRegistry): Router {
  const r = Router({ mergeParams: true });

  r.post('/:teamId/prospects/:id/surfaces', requireTeam('surfaces.run'), async (req, res) => {
    const { id } = parse(prospectParams, req.params);
    const params = parse(surfaceRequestBody, req.body ?? {});
    const run = (progress?: Parameters<typeof createSurface>[5]) =>
      createSurface(db, teamIdOf(req), req.session!.user.id, id, params, progress);
    if (parse(asyncQuery, req.query).async === 'true') {
      res.status(202).json({ jobId: jobs.start(teamIdOf(req), 'surface', run).id });
      return;
    }
    res.status(201).json(await run());
  });
  r.get('/:teamId/prospects/:id/surfaces', requireTeam('team.read'), async (req, res) => {
    res.json(await listSurfaces(db, teamIdOf(req), parse(prospectParams, req.params).id));
  });
  r.get('/:teamId/surfaces/:surfaceId', requireTeam('team.read'), async (req, res) => {
    res.json(await getSurface(db, teamIdOf(req), parse(surfaceParams, req.params).surfaceId));
  });
  r.get('/:teamId/surfaces/:surfaceId/value', requireTeam('team.read'), async (req, res) => {
    const s = await getSurface(db, teamIdOf(req), parse(surfaceParams, req.params).surfaceId);
    const { lon, lat } = parse(pointQuery, req.query);
    res.json({ lon, lat, unit: s.unit, ...(valueAt(s.grid, lon, lat) ?? { value: null, stdDev: null }) });
  });
  r.get('/:teamId/surfaces/:surfaceId/planned-wells/:plannedWellId/value', requireTeam('team.read'), async (req, res) => {
    const s = await getSurface(db, teamIdOf(req), parse(surfaceParams, req.params).surfaceId);
    const pw = await getPlannedWell(db, teamIdOf(req), parse(z.object({ plannedWellId: z.string().uuid() }), req.params).plannedWellId);
    const [lon, lat] = pw.location.coordinates;
    res.json({ plannedWellId: pw.id, lon, lat, unit: s.unit, ...(valueAt(s.grid, lon, lat) ?? { value: null, stdDev: null }) });
  });
  r.delete('/:teamId/surfaces/:surfaceId', requireTeam('surfaces.run'), async (req, res) => {
    await deleteSurface(db, teamIdOf(req), parse(surfaceParams, req.params).surfaceId);
    res.status(204).end();
  });
  return r;
}
