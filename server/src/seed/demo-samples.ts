import { sampleBoardInput } from '@layerbook/contracts';
import { and, eq, sampleBoards, type TenantTx } from '@layerbook/db';
import { recordAudit } from '../audit/record';
import type { Actor } from '../http/actor';
import { parse } from '../http/validate';
import { createBoard, startNextRound } from '../samples/boards';
import type { DemoLibrary } from './demo-library';

const DAY = 86_400_000;

/**
 * The demo's sample boards for the demo client's house, as the office and the client would leave them:
 * the stair hall's first round, which the client asked to make warmer, and its second round she
 * approved (the control sample the crew match); the turret room's board, shown and waiting for her;
 * and a draft for the library still being made. Made through the samples service (finish snapshot,
 * audit); the client's answers are set on the rows as `decideBoard` sets them, since the seed queues no mail.
 */
export async function seedDemoSamples(
  tx: TenantTx,
  p: { clientId: string; siteId: string; officeId: string; portalUserId: string; library: DemoLibrary; now: Date },
): Promise<void> {
  const office: Actor = { kind: 'staff', userId: p.officeId, role: 'office' };
  const client: Actor = { kind: 'client', userId: p.portalUserId };
  const daysAgo = (n: number) => new Date(p.now.getTime() - n * DAY);
  const make = (label: string, finishSystemId: string, notes: string) =>
    createBoard(tx, office, parse(sampleBoardInput, { clientId: p.clientId, siteId: p.siteId, label, finishSystemId, notes }), p.now);
  const setState = async (boardId: string, status: 'shown' | 'approved' | 'changes_requested', comment = '', decidedDaysAgo?: number) => {
    const decided = decidedDaysAgo === undefined ? {} : { decidedAt: daysAgo(decidedDaysAgo), decidedBy: p.portalUserId };
    await tx.db
      .update(sampleBoards)
      .set({ status, clientComment: comment, ...decided })
      .where(and(eq(sampleBoards.tenantId, tx.tenantId), eq(sampleBoards.id, boardId)));
    await recordAudit(tx, {
      actorUserId: office.userId,
      actorKind: 'staff',
      action: 'samples.board_shown',
      entity: 'sample_board',
      entityId: boardId,
    });
    if (status === 'shown') return;
    await recordAudit(tx, {
      actorUserId: client.userId,
      actorKind: 'client',
      action: status === 'approved' ? 'samples.board_approved' : 'samples.changes_requested',
      entity: 'sample_board',
      entityId: boardId,
      data: comment ? { comment } : {},
    });
  };

  const stairs = await make(
    'Stair hall, burnished lime',
    p.library.systemIds.layeredLime,
    'Two 2 ft boards, trowelled in the hall under its own north light.',
  );
  await setState(stairs.id, 'changes_requested', 'Lovely movement. Could it be a shade warmer, with less grey in the burnish?', 40);
  const warmer = await startNextRound(tx, office, stairs.id);
  await setState(warmer.id, 'approved', '', 33);
  const turret = await make(
    'Turret room, two-coat limewash',
    p.library.systemIds.limewash,
    'Shown against the window bay and the oak trim.',
  );
  await setState(turret.id, 'shown');
  await make('Library, antiqued glaze', p.library.systemIds.antiquedGlaze, 'Make on a primed board once the sealer colour is chosen.');
}
