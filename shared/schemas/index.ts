export * from './auth';
export * from './workspace';
