/**
 * How the stage odds are spoken of. The odds are a firm setting (Settings → stage odds); the board
 * shows them only on request (a tooltip on the stage), and Today adds up the work they make likely.
 */
export const LIKELY_WORK_WORDS = {
  heading: 'Coming work',
  openCount: 'Open inquiries',
  estimated: 'Estimated, all open inquiries',
  likely: 'Likely work, by stage odds',
  explain:
    "Likely work counts each open inquiry's estimated value at the odds that an inquiry at its stage turns into a job. The odds per stage are yours to set in",
} as const;
