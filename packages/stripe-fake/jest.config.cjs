/** The stand-in's tests: each starts a fake on a free port and drives it through the real stripe SDK. */
module.exports = {
  displayName: 'stripe-fake',
  testEnvironment: 'node',
  rootDir: __dirname,
  roots: ['<rootDir>/src'],
  transform: { '^.+\\.ts$': ['ts-jest', { tsconfig: '<rootDir>/tsconfig.json' }] },
  testTimeout: 30000,
};
