// Two Jest projects: plain Node for the engine, generators and the API (supertest against the real
// Express app), and jest-expo for React Native components.
const esmPackages = [
  'better-auth', '@better-auth', 'better-call', '@better-fetch', 'jose', 'nanostores', '@noble',
  'rou3', 'defu', 'uncrypto', 'kysely', 'nanoid', 'zod', 'diff',
].join('|');

/** @type {import('jest').Config} */
module.exports = {
  projects: [
    {
      displayName: 'node',
      testEnvironment: 'node',
      testMatch: ['<rootDir>/tests/unit/**/*.test.ts', '<rootDir>/tests/api/**/*.test.ts'],
      transform: { '^.+\\.[cm]?[jt]sx?$': ['babel-jest', { presets: ['babel-preset-expo'] }] },
      transformIgnorePatterns: [`/node_modules/(?!(${esmPackages})/)`],
      moduleNameMapper: { '^@/(.*)$': '<rootDir>/$1' },
    },
    {
      displayName: 'app',
      preset: 'jest-expo',
      testMatch: ['<rootDir>/tests/components/**/*.test.tsx'],
      moduleNameMapper: { '^@/(.*)$': '<rootDir>/$1' },
    },
  ],
  testTimeout: 60000,
};
