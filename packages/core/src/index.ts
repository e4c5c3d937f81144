export * from './contract/network';
export * from './contract/health';
export * from './contract/api-error';
export * from './contract/auth';
export * from './contract/users';
export * from './access/roles';
export * from './access/policies';
export * from './access/password-policy';

export * from './errors/domain-error';
export * from './units/length';
export * from './units/mass';
export * from './panels/panel';
export * from './panels/blanket-size';
export * from './panels/panel-check';
export * from './contract/network-setup';
export * from './contract/receipts';
