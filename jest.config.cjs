/** `npx jest` at the root runs every package's and the server's tests. */
module.exports = {
  projects: ['<rootDir>/packages/domain/jest.config.cjs', '<rootDir>/server/jest.config.cjs'],
};
