export * from './audit-events';
export * from './invitations';
export * from './jobs';
export * from './mail-outbox';
export * from './members';
export * from './organizations';
export * from './users';
export * from './price-book';
