/** Where the e2e server and its inbox listen; own ports and database, so demo data is never touched. */
export const E2E = {
  port: 4310,
  smtpPort: 1126,
  mailWebPort: 1181,
  s3Port: 4570,
  /** The Stripe stand-in (packages/stripe-fake): the server's STRIPE_API_BASE and the card page. */
  stripePort: 12112,
  stripeSecretKey: 'sk_test_layerbook_e2e',
  stripeWebhookSecret: 'whsec_layerbook_e2e',
  db: 'layerbook_e2e',
  baseUrl: 'http://localhost:4310',
  stateDir: '.data/e2e',
} as const;
