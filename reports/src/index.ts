// Report definitions: see ../README.md.
export * from './sql';
export * from './tally-snapshot';
export * from './chapter-month-facts';
export * from './campaign-credit';
export * from './tally-status';
export * from './tally-snapshot-rollup';
