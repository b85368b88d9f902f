// Three projects: pure unit tests, API tests against real PostgreSQL, browser end-to-end tests.
// `npm test` (server/scripts/test.ts) prepares PostgreSQL, the web bundle and Chromium first.
const tsJest = [
  'ts-jest',
  {
    tsconfig: {
      module: 'commonjs',
      moduleResolution: 'bundler',
      target: 'es2022',
      jsx: 'react-jsx',
      esModuleInterop: true,
      resolveJsonModule: true,
      strict: true,
      isolatedModules: true,
      types: ['jest', 'node'],
    },
  },
];
const common = {
  rootDir: __dirname,
  testEnvironment: 'node',
  transform: { '^.+\\.tsx?$': tsJest },
  moduleNameMapper: { '^@/(.*)$': '<rootDir>/$1' },
};

module.exports = {
  projects: [
    {
      ...common,
      displayName: 'unit',
      testMatch: ['<rootDir>/tests/unit/**/*.test.ts', '<rootDir>/shared/**/*.test.ts', '<rootDir>/features/**/*.test.ts'],
    },
    {
      // React Native components rendered with jest-expo's preset and Testing Library.
      preset: 'jest-expo',
      rootDir: __dirname,
      displayName: 'components',
      testMatch: ['<rootDir>/features/**/*.test.tsx', '<rootDir>/components/**/*.test.tsx'],
      moduleNameMapper: { '^@/(.*)$': '<rootDir>/$1' },
    },
    {
      ...common,
      displayName: 'api',
      testMatch: ['<rootDir>/tests/api/**/*.test.ts'],
      // Set-up seeds databases and runs simulations: slower than a unit test on a loaded 2-core machine.
      setupFilesAfterEnv: ['<rootDir>/tests/support/slow-timeout.ts'],
    },
    {
      ...common,
      displayName: 'e2e',
      testMatch: ['<rootDir>/tests/e2e/**/*.test.ts'],
      setupFilesAfterEnv: ['<rootDir>/tests/support/slow-timeout.ts'],
    },
  ],
};
