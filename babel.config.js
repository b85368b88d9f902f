// jest-expo needs a Babel config; Metro uses babel-preset-expo by default.
module.exports = function (api) {
  api.cache(true);
  return { presets: ['babel-preset-expo'] };
};
