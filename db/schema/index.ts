// The Drizzle schema, one file per feature; drizzle.config.ts reads every file in this folder.
export * from './foundation';
export * from './editions';
export * from './sync';
