/** API and isolation tests run against a real PostgreSQL (ops/ starts it); one file at a time. */
module.exports = {
  displayName: 'server',
  testEnvironment: 'node',
  roots: ['<rootDir>/src'],
  transform: { '^.+\\.ts$': ['ts-jest', { tsconfig: '<rootDir>/tsconfig.json' }] },
  globalSetup: '<rootDir>/src/testing/global-setup.ts',
  testTimeout: 30000,
};
