import { Router } from 'express';
import { z } from 'zod';
import {
  offsetCandidatesQuery,
  offsetSetBody,
  prospectOffsetQuery,
  plannedWellBody,
  plannedWellPatchBody,
  prospectBody,
  prospectPatchBody,
} from '../../../shared/schemas/planning';
import type { Db } from '../../db/client';
import { parse } from '../../lib/parse';
import type { TeamChanges } from '../../lib/teamChanges';
import { requireTeam, teamIdOf } from '../../middleware/guards';
import { createProspect, deleteProspect, getProspect, listProspects, updateProspect } from '../prospects/prospects.service';
import { getOffsetSet, offsetCandidates, prospectOffsetWells, putOffsetSet } from './offsets.service';
import { createPlannedWell, deletePlannedWell, getPlannedWell, listPlannedWells, updatePlannedWell } from './plannedWells.service';

const idParam = z.object({ id: z.string().uuid('must be an id') });

export function planningRouter(db: Db, changes: TeamChanges): Router {
  const r = Router({ mergeParams: true });
  const read = requireTeam('team.read');
  const id = (req: { params: unknown }) => parse(idParam, req.params).id;

  r.get('/:teamId/prospects', read, async (req, res) => {
    res.json(await listProspects(db, teamIdOf(req)));
  });
  r.get('/:teamId/prospects/:id', read, async (req, res) => {
    res.json(await getProspect(db, teamIdOf(req), id(req)));
  });
  r.post('/:teamId/prospects', requireTeam('prospects.edit'), async (req, res) => {
    const p = await createProspect(db, teamIdOf(req), req.session!.user.id, parse(prospectBody, req.body));
    changes.bump(teamIdOf(req));
    res.status(201).json(p);
  });
  r.patch('/:teamId/prospects/:id', requireTeam('prospects.edit'), async (req, res) => {
    const p = await updateProspect(db, teamIdOf(req), req.session!.user.id, id(req), parse(prospectPatchBody, req.body));
    changes.bump(teamIdOf(req));
    res.json(p);
  });
  r.delete('/:teamId/prospects/:id', requireTeam('prospects.edit'), async (req, res) => {
    await deleteProspect(db, teamIdOf(req), id(req));
    changes.bump(teamIdOf(req));
    res.status(204).end();
  });

  r.get('/:teamId/prospects/:id/offset-wells', read, async (req, res) => {
    res.json(await prospectOffsetWells(db, teamIdOf(req), id(req), parse(prospectOffsetQuery, req.query).bufferKm));
  });

  r.get('/:teamId/planned-wells', read, async (req, res) => {
    res.json(await listPlannedWells(db, teamIdOf(req)));
  });
  r.get('/:teamId/planned-wells/:id', read, async (req, res) => {
    res.json(await getPlannedWell(db, teamIdOf(req), id(req)));
  });
  r.post('/:teamId/planned-wells', requireTeam('plannedWells.edit'), async (req, res) => {
    const p = await createPlannedWell(db, teamIdOf(req), req.session!.user.id, parse(plannedWellBody, req.body));
    changes.bump(teamIdOf(req));
    res.status(201).json(p);
  });
  r.patch('/:teamId/planned-wells/:id', requireTeam('plannedWells.edit'), async (req, res) => {
    const p = await updatePlannedWell(db, teamIdOf(req), req.session!.user.id, id(req), parse(plannedWellPatchBody, req.body));
    changes.bump(teamIdOf(req));
    res.json(p);
  });
  r.delete('/:teamId/planned-wells/:id', requireTeam('plannedWells.edit'), async (req, res) => {
    await deletePlannedWell(db, teamIdOf(req), id(req));
    changes.bump(teamIdOf(req));
    res.status(204).end();
  });

  r.get('/:teamId/planned-wells/:id/offset-candidates', read, async (req, res) => {
    res.json(await offsetCandidates(db, teamIdOf(req), id(req), parse(offsetCandidatesQuery, req.query)));
  });
  r.get('/:teamId/planned-wells/:id/offsets', read, async (req, res) => {
    res.json(await getOffsetSet(db, teamIdOf(req), id(req)));
  });
  r.put('/:teamId/planned-wells/:id/offsets', requireTeam('offsets.edit'), async (req, res) => {
    res.json(await putOffsetSet(db, teamIdOf(req), req.session!.user.id, id(req), parse(offsetSetBody, req.body)));
  });
  return r;
}
