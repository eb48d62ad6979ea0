import type { StaffRole, StaffSession } from '@layerbook/contracts/types';

/** A signed-in staff member's session as the API answers it, for specs (`Session.accept`, a mocked sign-in answer). */
export function staffSession(role: StaffRole = 'owner', csrfToken = 't'): StaffSession {
  return {
    user: {
      id: 'u1',
      name: 'Ada',
      email: 'ada@example.com',
      role,
      firmId: 'f1',
      firmName: 'Fernhollow',
      language: 'en',
      ownLanguage: null,
      units: 'imperial',
      country: 'US',
      timeZone: 'America/New_York',
      otherFirms: [],
    },
    csrfToken,
  };
}
