import { Router } from 'express';
import { z } from 'zod';
import { saveInterpretationBody } from '../../../shared/schemas/interpretations';
import type { Db } from '../../db/client';
import { parse } from '../../lib/parse';
import type { TeamChanges } from '../../lib/teamChanges';
import { requireTeam, teamIdOf } from '../../middleware/guards';
import { currentInterpretation, listInterpretations, restoreInterpretation, saveInterpretation } from './interpretations.service';

const wellParams = z.object({ wellId: z.string().uuid('must be a well id') });
const versionParams = wellParams.extend({ version: z.coerce.number().int().min(1) });
const restoreBody = z.object({ baseVersion: z.number().int().min(1).nullable() });

export function interpretationsRouter(db: Db, changes: TeamChanges): Router {
  const r = Router({ mergeParams: true });
  r.get('/:teamId/wells/:wellId/interpretations', requireTeam('team.read'), async (req, res) => {
    res.json(await listInterpretations(db, teamIdOf(req), parse(wellParams, req.params).wellId));
  });
  r.get('/:teamId/wells/:wellId/interpretations/current', requireTeam('team.read'), async (req, res) => {
    res.json(await currentInterpretation(db, teamIdOf(req), parse(wellParams, req.params).wellId));
  });
  r.post('/:teamId/wells/:wellId/interpretations', requireTeam('interpretations.edit'), async (req, res) => {
    const saved = await saveInterpretation(
      db,
      teamIdOf(req),
      parse(wellParams, req.params).wellId,
      req.session!.user.id,
      parse(saveInterpretationBody, req.body),
    );
    changes.bump(teamIdOf(req));
    res.status(201).json(saved);
  });
  r.post('/:teamId/wells/:wellId/interpretations/:version/restore', requireTeam('interpretations.edit'), async (req, res) => {
    const { wellId, version } = parse(versionParams, req.params);
    const saved = await restoreInterpretation(
      db,
      teamIdOf(req),
      wellId,
      req.session!.user.id,
      version,
      parse(restoreBody, req.body).baseVersion,
    );
    changes.bump(teamIdOf(req));
    res.status(201).json(saved);
  });
  return r;
}
