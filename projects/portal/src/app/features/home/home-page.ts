import { ChangeDetectionStrategy, Component } from '@angular/core';
import { ProposalList } from '../proposals/proposal-list';
import { WaitingBoards } from '../samples/waiting-boards';

/** The portal's home: what waits for the client's answer first (sample boards), then their projects. */
@Component({
  selector: 'lb-home-page',
  imports: [ProposalList, WaitingBoards],
  template: `
    <lb-proposal-list>
      <lb-waiting-boards />
    </lb-proposal-list>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class HomePage {}
