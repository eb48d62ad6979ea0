/** Test database settings; the defaults mirror ops/env.sh so `npm test` needs no configuration. */
export const TEST_DB = process.env['LB_TEST_DB'] ?? 'layerbook_test';
const port = process.env['LB_PG_PORT'] ?? '54329';
const pw = (name: string, fallback: string) => process.env[name] ?? fallback;

export const testDatabaseUrls = (db = TEST_DB) => ({
  DATABASE_URL: `postgres://layerbook_app:${pw('LB_APP_PASSWORD', 'layerbook-app-local')}@127.0.0.1:${port}/${db}`,
  DATABASE_OWNER_URL: `postgres://layerbook_owner:${pw('LB_OWNER_PASSWORD', 'layerbook-owner-local')}@127.0.0.1:${port}/${db}`,
  DATABASE_JOBS_URL: `postgres://layerbook_jobs:${pw('LB_JOBS_PASSWORD', 'layerbook-jobs-local')}@127.0.0.1:${port}/${db}`,
});
