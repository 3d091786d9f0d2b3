import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import type { CDPSession } from 'playwright-core';
import { projectRoot } from '../../../infra/src/paths';
import { openBrowser } from '../../../test/support/browser';
import type { BenchTable } from '../bench-table';
import { signInInBrowser } from './bench-session';

export const INITIAL_TRANSFER_TARGET_KB = 250;
const DIST = path.join(projectRoot, 'dist', 'designer', 'browser');

/** Strings that survive minification and mark a heavy library inside a built chunk. */
const MARKERS: Record<string, string> = { 'three.js': '__THREE__', echarts: '[ECharts]', mathjs: 'typed-function' };

type Fetched = { url: string; type: string; bytes: number; encoding: string };

/** Records every response's over-the-wire size (CDP Network.loadingFinished encodedDataLength). */
function networkLog(cdp: CDPSession) {
  const fetched: Fetched[] = [];
  const pending = new Map<string, { url: string; type: string; encoding: string }>();
  let lastActivity = Date.now();
  cdp.on('Network.requestWillBeSent', (e) => {
    pending.set(e.requestId, { url: e.request.url, type: e.type ?? 'Other', encoding: '' });
    lastActivity = Date.now();
  });
  cdp.on('Network.responseReceived', (e) => {
    const p = pending.get(e.requestId);
    if (p) {
      p.type = e.type;
      p.encoding = String(e.response.headers['content-encoding'] ?? e.response.headers['Content-Encoding'] ?? '');
    }
    lastActivity = Date.now();
  });
  cdp.on('Network.loadingFinished', (e) => {
    const p = pending.get(e.requestId);
    if (p) fetched.push({ ...p, bytes: e.encodedDataLength });
    pending.delete(e.requestId);
    lastActivity = Date.now();
  });
  cdp.on('Network.loadingFailed', (e) => {
    pending.delete(e.requestId);
    lastActivity = Date.now();
  });
  return {
    fetched,
    /** Resolves once nothing has been in flight for `quietMs`. */
    idle: async (quietMs = 750) => {
      while (pending.size > 0 || Date.now() - lastActivity < quietMs) await new Promise((r) => setTimeout(r, 50));
    },
  };
}

const kB = (bytes: number) => bytes / 1000;
const kind = (f: Fetched) =>
  f.type === 'Script'
    ? 'JS'
    : f.type === 'Stylesheet'
      ? 'CSS'
      : f.type === 'Font'
        ? 'fonts'
        : f.type === 'Document'
          ? 'HTML'
          : f.type === 'XHR' || f.type === 'Fetch'
            ? 'API'
            : 'other';

function summarise(fetched: Fetched[]) {
  const by: Record<string, number> = { JS: 0, CSS: 0, fonts: 0, HTML: 0, API: 0, other: 0 };
  for (const f of fetched) by[kind(f)] += f.bytes;
  return { total: fetched.reduce((s, f) => s + f.bytes, 0), by };
}

/** Which built chunks hold which heavy library (by marker). */
function chunkLibraries(): Map<string, string[]> {
  const found = new Map<string, string[]>();
  for (const file of readdirSync(DIST).filter((f) => f.endsWith('.js'))) {
    const text = readFileSync(path.join(DIST, file), 'utf8');
    const libs = Object.entries(MARKERS)
      .filter(([, marker]) => text.includes(marker))
      .map(([lib]) => lib);
    if (libs.length) found.set(file, libs);
  }
  return found;
}

/**
 * The designer's first screens from a cold cache in Chromium: the sign-in page, then the projects
 * page after signing in. Sums the bytes over the wire of everything fetched until the network is
 * idle, by kind, and checks that no heavy library (three.js, echarts, mathjs) is in what was fetched.
 */
export async function measureInitialTransfer(baseUrl: string, table: BenchTable): Promise<Record<string, unknown>> {
  const browser = await openBrowser();
  try {
    const { page, context } = browser;
    const cdp = await context.newCDPSession(page);
    const log = networkLog(cdp);
    await cdp.send('Network.enable');
    await page.goto(`${baseUrl}/signin`);
    await page.locator('[data-testid="signin-submit"]').waitFor();
    await log.idle();
    const signIn = log.fetched.slice();
    await signInInBrowser(page, baseUrl);
    await log.idle();
    const projects = log.fetched.slice(signIn.length);

    const first = summarise(signIn);
    const both = summarise([...signIn, ...projects]);
    const verdict = (bytes: number) =>
      kB(bytes) <= INITIAL_TRANSFER_TARGET_KB
        ? `meets ≤ ${INITIAL_TRANSFER_TARGET_KB} kB`
        : `OVER the ${INITIAL_TRANSFER_TARGET_KB} kB target`;
    const parts = (s: ReturnType<typeof summarise>) =>
      Object.entries(s.by)
        .filter(([, b]) => b > 0)
        .map(([k, b]) => `${k} ${kB(b).toFixed(1)}`)
        .join(', ');
    // What index.html itself references (the builder's "initial" chunks); everything else is lazy.
    const html = readFileSync(path.join(DIST, 'index.html'), 'utf8');
    const initialFiles = new Set([...html.matchAll(/(?:src|href)="([^"]+\.(?:js|css))"/g)].map((m) => path.basename(m[1])));
    const initial = signIn.filter((f) => f.type === 'Document' || initialFiles.has(path.basename(new URL(f.url).pathname)));
    const init = summarise(initial);
    table.record(
      'designer initial chunks (index.html and what it loads)',
      kB(init.total),
      'kB',
      `${verdict(init.total)}; ${parts(init)}; ${initialFiles.size} files`,
    );
    table.record('designer sign-in page, cold: bytes over the wire', kB(first.total), 'kB', `${verdict(first.total)}; ${parts(first)}`);
    table.record('… then signed in to the projects page: total', kB(both.total), 'kB', `${verdict(both.total)}; ${parts(both)}`);
    for (const k of ['JS', 'CSS', 'fonts'] as const) table.record(`  of which ${k} (sign-in + projects)`, kB(both.by[k]), 'kB');

    const libs = chunkLibraries();
    const fetchedFiles = new Set([...signIn, ...projects].map((f) => path.basename(new URL(f.url).pathname)));
    const eager = [...libs].filter(([file]) => fetchedFiles.has(file));
    const lazy = [...libs].filter(([file]) => !fetchedFiles.has(file));
    const describe = (list: [string, string[]][]) =>
      list.map(([file, l]) => `${file} (${l.join(', ')}, ${(statSync(path.join(DIST, file)).size / 1000).toFixed(0)} kB raw)`);
    console.log(`  lazy chunks with a heavy library: ${describe(lazy).join('; ') || 'none'}`);
    console.log(`  heavy libraries fetched on the first screens: ${describe(eager).join('; ') || 'none'}`);
    const uncompressed = [...signIn, ...projects]
      .filter((f) => ['JS', 'CSS', 'HTML'].includes(kind(f)) && !f.encoding && f.bytes > 1500)
      .map((f) => path.basename(new URL(f.url).pathname));
    if (uncompressed.length) console.log(`  sent without compression: ${uncompressed.join(', ')}`);
    table.record(
      'heavy-library chunks fetched on the first screens',
      eager.length,
      'chunks',
      eager.length === 0 ? 'three.js, echarts, mathjs all lazy' : 'SHOULD be lazy',
    );
    return {
      signIn: { ...first, files: signIn.map((f) => ({ ...f, url: new URL(f.url).pathname })) },
      projects: { ...summarise(projects), files: projects.map((f) => ({ ...f, url: new URL(f.url).pathname })) },
      lazyChunks: Object.fromEntries(lazy),
      eagerHeavyChunks: Object.fromEntries(eager),
      uncompressed,
    };
  } finally {
    await browser.close();
  }
}
