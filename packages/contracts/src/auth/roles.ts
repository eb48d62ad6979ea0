import { z } from 'zod';
import { STAFF_ROLES } from './auth-types';

export const staffRole = z.enum(STAFF_ROLES, { error: 'Choose owner, office or crew.' });
