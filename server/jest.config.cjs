/** API and isolation tests run against a real PostgreSQL (ops/ starts it); one file at a time. */
module.exports = {
  displayName: 'server',
  testEnvironment: 'node',
  // ops/backup holds the backup round trip (it drives ops/backup.sh and ops/restore.sh), ops/build the icon font's
  // check (ops/build/subset-icons.spec.ts); nothing else under ops/ is a test.
  roots: ['<rootDir>/src', '<rootDir>/../ops'],
  testMatch: ['<rootDir>/src/**/*.spec.ts', '<rootDir>/../ops/backup/**/*.spec.ts', '<rootDir>/../ops/build/**/*.spec.ts'],
  transform: { '^.+\\.ts$': ['ts-jest', { tsconfig: '<rootDir>/tsconfig.json' }] },
  globalSetup: '<rootDir>/src/testing/global-setup.ts',
  testTimeout: 30000,
};
