/** Jest runs the API's TypeScript as ES modules; see DEVELOPERS.md for why. */
export default {
  testEnvironment: 'node',
  rootDir: '.',
  testRegex: '(src/.*\\.spec|test/.*\\.e2e-spec)\\.ts$',
  extensionsToTreatAsEsm: ['.ts'],
  moduleNameMapper: { '^(\\.{1,2}/.*)\\.js$': '$1' },
  transform: { '^.+\\.ts$': ['ts-jest', { useESM: true }] },
  testTimeout: 30000,
};
