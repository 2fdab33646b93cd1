export * from './auth';
