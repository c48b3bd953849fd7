// Shared @swc/jest transform: TypeScript with legacy decorators and emitted metadata (NestJS DI needs both).
module.exports = [
  '@swc/jest',
  {
    jsc: {
      parser: { syntax: 'typescript', decorators: true },
      transform: { legacyDecorator: true, decoratorMetadata: true },
      target: 'es2022',
    },
    module: { type: 'commonjs' },
  },
];
