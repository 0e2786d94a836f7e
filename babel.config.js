// Under jest (which runs CommonJS), `import()` becomes a require: Metro splits the web build at each
// `import()` (components/lazy/deferred.tsx), jest cannot run one without --experimental-vm-modules.
const importToRequire = ({ types: t }) => ({
  visitor: {
    CallExpression(p) {
      if (p.node.callee.type !== 'Import') return;
      const load = t.arrowFunctionExpression([], t.callExpression(t.identifier('require'), p.node.arguments));
      p.replaceWith(t.callExpression(t.memberExpression(t.callExpression(t.memberExpression(t.identifier('Promise'), t.identifier('resolve')), []), t.identifier('then')), [load]));
    },
  },
});

module.exports = function (api) {
  const underJest = api.caller((caller) => Boolean(caller && caller.name === 'babel-jest'));
  const anyJest = api.cache.using(() => Boolean(process.env.JEST_WORKER_ID));
  return {
    presets: ['babel-preset-expo'],
    plugins: anyJest ? [importToRequire] : [],
    // Under jest (server tests), Sequelize models declare their attributes with `declare` fields, so
    // that no runtime field shadows Sequelize's getters; the TypeScript transform must allow them.
    // The server itself runs under tsx (esbuild), and Metro never bundles server/.
    overrides: underJest
      ? [{ test: /\.ts$/, plugins: [['@babel/plugin-transform-typescript', { allowDeclareFields: true }]] }]
      : [],
  };
};
