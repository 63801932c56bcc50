import { Router } from 'express';
import { z } from 'zod';
import { wellListQuery, wellPatchBody } from '../../../shared/schemas/wells';
import type { Db } from '../../db/client';
import { parse } from '../../lib/parse';
import type { TeamChanges } from '../../lib/teamChanges';
import { requireTeam, teamIdOf } from '../../middleware/guards';
import { getLog, getWell, listLogs, listPressures, listSurvey, listWells, patchWell } from './wells.service';

const wellParams = z.object({ wellId: z.string().uuid('must be a well id') });
const curveParams = wellParams.extend({ curveId: z.string().uuid('must be a curve id') });
const curveQuery = z.object({ maxPoints: z.coerce.number().int().min(10).max(200_000).optional() });

export function wellsRouter(db: Db, changes: TeamChanges): Router {
  const r = Router({ mergeParams: true });
  const read = requireTeam('team.read');
  r.get('/:teamId/wells', read, async (req, res) => {
    res.json(await listWells(db, teamIdOf(req), parse(wellListQuery, req.query)));
  });
  r.get('/:teamId/wells/:wellId', read, async (req, res) => {
    res.json(await getWell(db, teamIdOf(req), parse(wellParams, req.params).wellId));
  });
  r.patch('/:teamId/wells/:wellId', requireTeam('wells.edit'), async (req, res) => {
    const { wellId } = parse(wellParams, req.params);
    const well = await patchWell(db, teamIdOf(req), wellId, req.session!.user.id, parse(wellPatchBody, req.body));
    changes.bump(teamIdOf(req));
    res.json(well);
  });
  r.get('/:teamId/wells/:wellId/pressures', read, async (req, res) => {
    res.json(await listPressures(db, teamIdOf(req), parse(wellParams, req.params).wellId));
  });
  r.get('/:teamId/wells/:wellId/surveys', read, async (req, res) => {
    res.json(await listSurvey(db, teamIdOf(req), parse(wellParams, req.params).wellId));
  });
  r.get('/:teamId/wells/:wellId/logs', read, async (req, res) => {
    res.json(await listLogs(db, teamIdOf(req), parse(wellParams, req.params).wellId));
  });
  r.get('/:teamId/wells/:wellId/logs/:curveId', read, async (req, res) => {
    const { wellId, curveId } = parse(curveParams, req.params);
    res.json(await getLog(db, teamIdOf(req), wellId, curveId, parse(curveQuery, req.query).maxPoints));
  });
  return r;
}
