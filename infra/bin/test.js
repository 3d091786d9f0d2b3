#!/usr/bin/env node
// `npm test`: installs what is missing, then type-checks and runs every suite.
const { ensureInstall, root } = require('./ensure-install');
ensureInstall();
process.chdir(root);
require('tsx/cjs/api').register();
require('../src/test.ts');
