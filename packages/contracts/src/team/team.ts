import { z } from 'zod';
import { email } from '../auth/fields';
import { staffRole } from '../auth/roles';
import { requestSchema } from '../common/schema-check';
import type { InvitationCreate, MemberRoleUpdate } from './team-types';

export const invitationCreate = requestSchema<InvitationCreate>()(z.strictObject({ email, role: staffRole }));

export const memberRoleUpdate = requestSchema<MemberRoleUpdate>()(z.strictObject({ role: staffRole }));

export const idParam = z.strictObject({ id: z.uuid({ error: 'Not a valid id.' }) });
