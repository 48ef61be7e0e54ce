/**
 * Request and response shapes of Sheaf's HTTP API, shared by the server (which validates with
 * them and documents them as OpenAPI) and the web app (which imports the inferred types).
 */
export * from './common';
export * from './auth';
export * from './organizations';
export * from './projects';
export * from './sheets';
export * from './system';
export * from './review';
export * from './notes';
export * from './revisions';
export * from './materials';
export * from './templates';
export * from './permissions';
