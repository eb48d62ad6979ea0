import type { InquiryStage } from '@layerbook/contracts/types';

/** An icon per stage (Material Symbols names), so a stage never reads by colour alone. */
export const STAGE_ICONS: Readonly<Record<InquiryStage, string>> = {
  new: 'fiber_new',
  contacted: 'call',
  visit_booked: 'event',
  samples: 'palette',
  proposal_sent: 'description',
  won: 'handshake',
  lost: 'block',
};
