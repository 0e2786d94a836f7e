module.exports = function (api) {
  const underJest = api.caller((caller) => Boolean(caller && caller.name === 'babel-jest'));
  return {
    presets: ['babel-preset-expo'],
    // Under jest (server tests), Sequelize models declare their attributes with `declare` fields, so
    // that no runtime field shadows Sequelize's getters; the TypeScript transform must allow them.
    // The server itself runs under tsx (esbuild), and Metro never bundles server/.
    overrides: underJest
      ? [{ test: /\.ts$/, plugins: [['@babel/plugin-transform-typescript', { allowDeclareFields: true }]] }]
      : [],
  };
};
