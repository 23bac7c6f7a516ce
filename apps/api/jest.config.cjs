// Jest cannot load ESM-only NestJS 12 on Node 20: @swc/jest compiles our TypeScript and the ESM
// dependencies to CommonJS (see shared STACK.md).
const swc = {
  jsc: {
    parser: { syntax: 'typescript', decorators: true },
    transform: { legacyDecorator: true, decoratorMetadata: true },
    target: 'es2023',
  },
  module: { type: 'commonjs' },
};

module.exports = {
  rootDir: '../..',
  roots: ['<rootDir>/apps/api/src', '<rootDir>/tests/api'],
  testRegex: '\\.(e2e-)?spec\\.ts$',
  testEnvironment: 'node',
  testEnvironmentOptions: { customExportConditions: ['source', 'node', 'require', 'default'] },
  moduleNameMapper: { '^(\\.{1,2}/.*)\\.js$': '$1' },
  transform: { '^.+\\.(t|j|cj|mj)s$': ['@swc/jest', swc] },
  transformIgnorePatterns: ['/node_modules/(?!(@nestjs|uid|load-esm|file-type|@electric-sql|strtok3|token-types|@tokenizer)/)'],
  testTimeout: 30000,
};
