/** Where the e2e server and its inbox listen; own ports and database, so demo data is never touched. */
export const E2E = {
  port: 4310,
  smtpPort: 1126,
  mailWebPort: 1181,
  s3Port: 4570,
  db: 'layerbook_e2e',
  baseUrl: 'http://localhost:4310',
  stateDir: '.data/e2e',
} as const;
