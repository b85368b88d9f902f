export * from './error';
export * from './auth';
export * from './team';
export * from './admin';
export * from './outbox';
export * from './study-area';
