// babel-preset-expo enables legacy decorators; TypeORM also needs the design:type metadata that
// only this plugin writes under Babel ("Column type … is not defined" without it).
module.exports = function (api) {
  api.cache(true);
  return {
    presets: ['babel-preset-expo'],
    plugins: ['babel-plugin-transform-typescript-metadata'],
  };
};
