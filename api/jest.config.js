/** Jest runs the API's TypeScript as ES modules; see DEVELOPERS.md for why. */
export default {
  testEnvironment: 'node',
  rootDir: '.',
  testRegex: '(src/.*\\.spec|test/.*\\.e2e-spec)\\.ts$',
  extensionsToTreatAsEsm: ['.ts'],
  moduleNameMapper: { '^(\\.{1,2}/.*)\\.js$': '$1' },
  transform: { '^.+\\.ts$': ['ts-jest', { useESM: true }] },
  // Deployment shapes SQLite does not have (several API processes on one database) run only on PostgreSQL.
  testPathIgnorePatterns: ['/node_modules/', ...(process.env.DB_TYPE === 'postgres' ? [] : ['/test/postgres/'])],
  testTimeout: 30000,
};
