// Metro config: Expo defaults plus one redirect that keeps zod's ~50 locales out of the web bundle.
const path = require('path');
const { getDefaultConfig } = require('expo/metro-config');

const config = getDefaultConfig(__dirname);

// zod 4 re-exports every locale through `export * as locales`, which Metro cannot drop (~270 KB).
const zodLocalesShim = path.resolve(__dirname, 'shims/zod-locales.js');
const defaultResolve = config.resolver.resolveRequest;
config.resolver.resolveRequest = (context, moduleName, platform) => {
  if (
    moduleName === '../locales/index.js' &&
    context.originModulePath.includes(`${path.sep}node_modules${path.sep}zod${path.sep}`)
  ) {
    return { type: 'sourceFile', filePath: zodLocalesShim };
  }
  return (defaultResolve ?? context.resolveRequest)(context, moduleName, platform);
};

module.exports = config;
