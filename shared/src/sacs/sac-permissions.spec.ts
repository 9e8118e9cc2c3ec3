import { describe, expect, it } from 'vitest';
import { sacPermissions } from './sac-permissions.js';

// docs/product.md, Roles: the owner runs the project, caretakers log, partners read.
describe('sac permissions', () => {
  it('lets a caretaker pull and open only where the owner allowed it', () => {
    expect(sacPermissions('caretaker', false).pullAndOpen).toBe(false);
    expect(sacPermissions('caretaker', true).pullAndOpen).toBe(true);
    expect(sacPermissions('caretaker', true).edit).toBe(false);
    expect(sacPermissions('caretaker', false).log).toBe(true);
  });

  it('never lets a partner act, whatever the switch', () => {
    expect(sacPermissions('partner', true)).toEqual({ edit: false, pullAndOpen: false, log: false, setIncubatorRights: false });
  });

  it('lets the owner do everything', () => {
    expect(sacPermissions('owner', false)).toEqual({ edit: true, pullAndOpen: true, log: true, setIncubatorRights: true });
  });
});
