export * from './contract/network';
export * from './contract/health';
export * from './contract/api-error';
