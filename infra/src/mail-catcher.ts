import { spawn, type ChildProcess } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { projectRoot } from './paths';

export interface MailCatcherOptions {
  smtpPort: number;
  webPort: number;
  /** Folder where received mail is kept. */
  mailDir: string;
}

/**
 * maildev (ESM-only, so spawned rather than imported): an SMTP server that keeps every mail and
 * shows it in a web inbox with a REST API under /api. Bound to 127.0.0.1.
 */
export class MailCatcher {
  private child: ChildProcess | null = null;

  constructor(readonly options: MailCatcherOptions) {}

  get inboxUrl(): string {
    return `http://127.0.0.1:${this.options.webPort}`;
  }

  async start(): Promise<void> {
    if (this.child) return;
    const { smtpPort, webPort, mailDir } = this.options;
    mkdirSync(mailDir, { recursive: true });
    const bin = path.join(projectRoot, 'node_modules/maildev/dist/bin/maildev.js');
    const child = spawn(
      process.execPath,
      [
        bin,
        '--ip',
        '127.0.0.1',
        '--web-ip',
        '127.0.0.1',
        '-s',
        String(smtpPort),
        '-w',
        String(webPort),
        '--mail-directory',
        mailDir,
        '--silent',
      ],
      { stdio: ['ignore', 'pipe', 'pipe'] },
    );
    this.child = child;
    let output = '';
    child.stdout?.on('data', (d) => {
      output += d;
    });
    child.stderr?.on('data', (d) => {
      output += d;
    });
    const exited = new Promise<never>((_, reject) =>
      child.once('exit', (code) => reject(new Error(`maildev exited (${code}): ${output.trim()}`))),
    );
    await Promise.race([this.waitUntilHealthy(15000), exited]);
  }

  async stop(): Promise<void> {
    const child = this.child;
    this.child = null;
    if (!child || child.exitCode !== null) return;
    await new Promise<void>((resolve) => {
      // maildev waits for open SMTP connections on SIGTERM; do not wait for them for long.
      const force = setTimeout(() => child.kill('SIGKILL'), 2000);
      child.once('exit', () => {
        clearTimeout(force);
        resolve();
      });
      child.kill('SIGTERM');
    });
  }

  private async waitUntilHealthy(timeoutMs: number): Promise<void> {
    const deadline = Date.now() + timeoutMs;
    for (;;) {
      try {
        const res = await fetch(`${this.inboxUrl}/api/healthz`);
        if (res.ok) return;
      } catch {
        /* not up yet */
      }
      if (Date.now() > deadline) throw new Error(`maildev did not answer on ${this.inboxUrl} within ${timeoutMs} ms`);
      await new Promise((r) => setTimeout(r, 100));
    }
  }
}
