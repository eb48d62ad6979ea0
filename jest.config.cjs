/** `npx jest` at the root runs every package's and the server's tests. */
module.exports = {
  projects: [
    '<rootDir>/packages/domain/jest.config.cjs',
    '<rootDir>/packages/contracts/jest.config.cjs',
    '<rootDir>/packages/stripe-fake/jest.config.cjs',
    '<rootDir>/server/jest.config.cjs',
  ],
  // A global option (ignored inside project configs): API tests wait for e-mails through real jobs.
  testTimeout: 30000,
};
