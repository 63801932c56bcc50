import { describe, expect, it } from 'vitest';
import { ACTIONS, actionsOf, can, roleCan } from '../../../shared/auth/permissions';

// The grants are the product's own rule (DEVELOPERS.md): viewer reads and comments; geoscientists
// import and interpret; planners own prospects, planned wells, offsets and exports; admin everything.
describe('permission table', () => {
  it('gives the viewer read and comment only', () => {
    expect(actionsOf('viewer')).toEqual(['team.read', 'comment.write']);
  });

  it('lets geoscientists import and interpret but not export or manage members', () => {
    expect(roleCan('geoscientist', 'wells.import')).toBe(true);
    expect(roleCan('geoscientist', 'interpretations.edit')).toBe(true);
    expect(roleCan('geoscientist', 'surfaces.run')).toBe(true);
    expect(roleCan('geoscientist', 'exports.create')).toBe(false);
    expect(roleCan('geoscientist', 'members.manage')).toBe(false);
  });

  it('lets planners plan and export but not import', () => {
    for (const a of ['prospects.edit', 'plannedWells.edit', 'offsets.edit', 'exports.create', 'hazards.edit'] as const) {
      expect(roleCan('planner', a)).toBe(true);
    }
    expect(roleCan('planner', 'wells.import')).toBe(false);
  });

  it('gives admins every action', () => {
    expect(actionsOf('admin')).toEqual([...ACTIONS]);
  });

  it('checks the role of the team asked about, not of another team', () => {
    const memberships = [
      { teamId: 'team-a', role: 'admin' as const },
      { teamId: 'team-b', role: 'viewer' as const },
    ];
    expect(can(memberships, 'members.manage', 'team-a')).toBe(true);
    expect(can(memberships, 'members.manage', 'team-b')).toBe(false);
    expect(can(memberships, 'team.read', 'team-c')).toBe(false);
  });
});
