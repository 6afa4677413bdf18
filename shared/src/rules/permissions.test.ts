import { describe, expect, it } from 'vitest';

import { ROLES } from '../schemas/role.schema';
import { may, PERMISSIONS, type Permission } from './permissions';

// Separation of duties as 21 CFR 11 / GMP practice expects it: the people who write and run the
// process are not the ones who release recipes or decide on deviations.
describe('permissions', () => {
  it('when any permission is listed, then it names at least one real role and no role twice', () => {
    for (const [name, roles] of Object.entries(PERMISSIONS)) {
      expect(roles.length, name).toBeGreaterThan(0);
      expect(new Set(roles).size, name).toBe(roles.length);
      for (const role of roles) expect(ROLES).toContain(role);
    }
  });

  it('when someone may author recipes, then they may not review them', () => {
    for (const role of ROLES) expect(may(role, 'authorRecipes') && may(role, 'reviewRecipes'), role).toBe(false);
  });

  it('when an operator is asked about desk work, then only floor work is allowed', () => {
    const allowed = (Object.keys(PERMISSIONS) as Permission[]).filter((p) => may('operator', p));
    expect(allowed).toEqual(['workRuns']);
  });

  it('when quality decisions are asked, then only quality staff may make them', () => {
    expect(ROLES.filter((r) => may(r, 'decideQuality'))).toEqual(['quality']);
    expect(ROLES.filter((r) => may(r, 'reviewRecipes'))).toEqual(['quality']);
  });
});
