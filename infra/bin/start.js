#!/usr/bin/env node
// `npm start`: installs what is missing, then starts the local services and the server.
const { ensureInstall, root } = require('./ensure-install');
ensureInstall();
process.chdir(root);
require('tsx/cjs/api').register();
require('../src/start.ts');
