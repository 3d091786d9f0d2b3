// npm run bench: the engine micro-benchmarks, then the web benchmarks (browser and HTTP) against a
// throwaway stack. Prints tables and writes JSON to .data/bench/ (git-ignored). Benchmarks only —
// no test depends on timings. `npm run bench -- engine` or `-- web` (or `web:keystroke`,
// `web:transfer`, `web:throughput`) runs a part.
import { runEngineBench } from './engine-bench';
import { runWebBench, WEB_BENCHES, type WebBench } from './web/web-bench';

async function main(): Promise<void> {
  const args = process.argv.slice(2);
  const wanted = (group: string) => args.length === 0 || args.some((a) => a === group || a.startsWith(`${group}:`));
  const unknown = args.filter(
    (a) => !/^(engine|web)(:.*)?$/.test(a) || (a.startsWith('web:') && !WEB_BENCHES.includes(a.slice(4) as WebBench)),
  );
  if (unknown.length) throw new Error(`unknown benchmark ${unknown.join(', ')}: use engine, web or web:${WEB_BENCHES.join('|web:')}`);
  console.log(`Node ${process.version}, ${new Date().toISOString()}`);
  if (wanted('engine')) {
    console.log('\n━━ engine ━━');
    await runEngineBench();
  }
  if (wanted('web')) {
    console.log('\n━━ web ━━');
    const only = args.filter((a) => a.startsWith('web:')).map((a) => a.slice(4) as WebBench);
    await runWebBench(only.length ? only : WEB_BENCHES);
  }
}

main().then(
  () => process.exit(process.exitCode ?? 0),
  (e) => {
    console.error(e);
    process.exit(1);
  },
);
