export * from './audit-events';
export * from './invitations';
export * from './jobs';
export * from './mail-outbox';
export * from './organizations';
export * from './users';
