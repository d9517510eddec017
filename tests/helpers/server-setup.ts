// Server tests run against the real PostgreSQL that `npm test` starts (server/bootstrap/test.mjs).
if (!process.env.DATABASE_URL) {
  throw new Error('DATABASE_URL is not set: run server tests through `npm test -- --project server …`.');
}
process.env.NODE_ENV = 'test';
process.env.LOG_LEVEL ??= 'silent';
