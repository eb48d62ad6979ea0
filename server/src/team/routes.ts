import {
  idParam,
  invitationCreate,
  languageChoice,
  memberRoleUpdate,
  type ItemList,
  type TeamInvitation,
  type TeamMember,
} from '@layerbook/contracts';
import { Router } from 'express';
import type { AppContext } from '../context';
import { withStaff } from '../http/guards';
import { parse } from '../http/validate';
import { changeMember, invite, listInvitations, listMembers, revokeInvitation, setMemberLanguage } from './service';

/** Everyone on the team reads who is on it; only the owner invites, revokes and changes people. */
export function teamRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/members', async (req, res) => {
    const members = await withStaff(ctx, req, 'crew', (tx, staff) => listMembers(tx, staff.id));
    res.json(members satisfies ItemList<TeamMember>);
  });

  router.get('/invitations', async (req, res) => {
    const invitations = await withStaff(ctx, req, 'crew', (tx) => listInvitations(tx, ctx.now()));
    res.json(invitations satisfies ItemList<TeamInvitation>);
  });

  router.post('/invitations', async (req, res) => {
    const invitation = await withStaff(ctx, req, 'owner', (tx, staff) => invite(ctx, tx, staff, parse(invitationCreate, req.body)));
    res.status(201).json(invitation satisfies TeamInvitation);
  });

  router.delete('/invitations/:id', async (req, res) => {
    await withStaff(ctx, req, 'owner', (tx, staff) => revokeInvitation(ctx, tx, staff, parse(idParam, req.params).id));
    res.status(204).end();
  });

  router.patch('/members/:id', async (req, res) => {
    const member = await withStaff(ctx, req, 'owner', (tx, staff) => {
      const { id } = parse(idParam, req.params);
      return changeMember(tx, staff, id, { role: parse(memberRoleUpdate, req.body).role });
    });
    res.json(member satisfies TeamMember);
  });

  router.patch('/members/:id/language', async (req, res) => {
    const member = await withStaff(ctx, req, 'owner', (tx, staff) => {
      const { id } = parse(idParam, req.params);
      return setMemberLanguage(tx, staff, id, parse(languageChoice, req.body).language);
    });
    res.json(member satisfies TeamMember);
  });

  for (const [action, status] of [
    ['deactivate', 'deactivated'],
    ['reactivate', 'active'],
  ] as const) {
    router.post(`/members/:id/${action}`, async (req, res) => {
      const member = await withStaff(ctx, req, 'owner', (tx, staff) => changeMember(tx, staff, parse(idParam, req.params).id, { status }));
      res.json(member satisfies TeamMember);
    });
  }

  return router;
}
