import type { CampaignProgressView } from '@tallyloom/core';
import { toPublicProgress } from './public-progress';

describe('toPublicProgress', () => {
  it('keeps the public fields only', () => {
    const view: CampaignProgressView & { chapterNames: string[] } = {
      campaignId: 3,
      code: 'DWD26',
      name: 'Deep Winter Drive',
      goalPanels: 4000,
      startsOn: '2026-01-05',
      endsOn: '2026-03-29',
      creditedPanels: 1300,
      pendingPanels: 45,
      shareDone: 0.325,
      weeksElapsed: 5,
      weeksTotal: 12,
      weeksLeft: 7,
      pacePerWeek: 260,
      neededPerWeek: 2700 / 7,
      projection: { method: 'pace so far', panelsAtEnd: 3120, goalMetOn: null },
      weekly: [{ weekStart: '2026-01-05', panels: 200, cumulative: 200 }],
      asOf: '2026-02-09T08:00:00.000Z',
      // Something a later change might add to the full view: must not reach the public page.
      chapterNames: ['Alder Falls'],
    };
    const shown = toPublicProgress(view);
    expect(shown).toEqual({
      code: 'DWD26',
      name: 'Deep Winter Drive',
      goalPanels: 4000,
      startsOn: '2026-01-05',
      endsOn: '2026-03-29',
      creditedPanels: 1300,
      shareDone: 0.325,
      weeksLeft: 7,
      pacePerWeek: 260,
      neededPerWeek: 2700 / 7,
      weekly: [{ weekStart: '2026-01-05', panels: 200, cumulative: 200 }],
      asOf: '2026-02-09T08:00:00.000Z',
    });
    expect(JSON.stringify(shown)).not.toContain('Alder Falls');
  });
});
