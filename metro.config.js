const { getDefaultConfig } = require('expo/metro-config');
const path = require('path');
const fs = require('fs');
const { FileStore } = require('metro-cache');

const config = getDefaultConfig(__dirname);
// expo-sqlite's web build imports a .wasm file.
config.resolver.assetExts.push('wasm');
// Keep Metro's cache inside node_modules (avoids "Cache write error ENOENT" on clean machines).
const cacheDir = path.join(__dirname, 'node_modules', '.cache', 'metro');
fs.mkdirSync(cacheDir, { recursive: true });
config.cacheStores = [new FileStore({ root: cacheDir })];
// Tests, server code and generated folders are not part of the app bundle.
const escape = (s) => s.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&');
config.resolver.blockList = ['tests', 'server', 'dist-server', 'dist', 'test-artifacts', 'cli', 'scripts', 'data'].map(
  (dir) => new RegExp('^' + escape(path.join(__dirname, dir)) + '\\/.*'),
);
module.exports = config;
