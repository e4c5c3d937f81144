// Report definitions: see ../README.md.
export * from './sql';
export * from './tally-snapshot';
export * from './chapter-month-facts';
export * from './campaign-credit';
export * from './tally-status';
export * from './tally-snapshot-rollup';
export * from './snapshot-sources';
export * from './stored-targets';
export * from './sum-of-parts';
export * from './impact-agency-kinds';
export * from './impact-gaps';
export * from './impact-methodology';
export * from './impact-pack-layout';
export * from './impact-volunteer-value';
