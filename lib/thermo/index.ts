// Public API of the Rungbook thermochemistry engine, for the server, scripts and tests: the engine
// (engine.ts) plus `solveRequestSchema` typed for the server's classic-zod route helpers
// (request-schema.ts). Code that runs in the browser imports '@/lib/thermo/engine' instead, so it
// does not load classic zod (eslint.config.mjs holds it to that).
export * from './engine';
export { solveRequestSchema } from './request-schema';
