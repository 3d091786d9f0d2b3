// Command line: npm run analyze -- FILE...
// Reads part documents (JSON files), prints one spin report per line as JSON on stdout; each failure
// is one JSON line on stderr ({ file, error: { code, message, field?, issues? } }) and the exit code
// is 2 if any file failed. Node-only by design (the one file under shared/src that may be).
import { readFileSync } from 'node:fs';
import { analyzePart, EngineInputError } from '../engine/public-api';

function fail(file: string, code: string, message: string, issues?: { path: string; message: string }[]): void {
  const field = issues?.[0]?.path;
  process.stderr.write(
    `${JSON.stringify({ file, error: { code, message, ...(field ? { field } : {}), ...(issues ? { issues } : {}) } })}\n`,
  );
}

function main(files: string[]): number {
  if (files.length === 0) {
    fail('', 'usage', 'usage: npm run analyze -- FILE.json [FILE.json ...]');
    return 2;
  }
  let failed = false;
  for (const file of files) {
    let json: unknown;
    try {
      json = JSON.parse(readFileSync(file, 'utf8'));
    } catch (e) {
      fail(file, 'unreadable', e instanceof Error ? e.message : String(e));
      failed = true;
      continue;
    }
    try {
      process.stdout.write(`${JSON.stringify(analyzePart(json))}\n`);
    } catch (e) {
      failed = true;
      if (e instanceof EngineInputError) fail(file, e.kind === 'invalid' ? 'invalid_part' : 'unanalysable_part', e.message, e.issues);
      else fail(file, 'internal', e instanceof Error ? e.message : String(e));
    }
  }
  return failed ? 2 : 0;
}

process.exitCode = main(process.argv.slice(2));
