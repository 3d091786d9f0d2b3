// Worker-thread entry of the compute pool. Worker threads do not inherit the TypeScript loader of
// the main thread in every runner (jest, tsx), so this plain file registers it before loading the
// worker module.
require('tsx/cjs/api').register();
module.exports = require('./compute-worker.ts').default;
