import { readFileSync } from 'node:fs';
import path from 'node:path';

/** Stored with every spin report, so a report can be traced to the engine that made it. */
export const ENGINE_VERSION = `engine ${(JSON.parse(readFileSync(path.resolve(__dirname, '../../../package.json'), 'utf8')) as { version: string }).version}`;
