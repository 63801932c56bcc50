import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { createApp } from '../../../server/app';
import { startTestApp, type TestContext } from '../../api/support/testApp';

export const ARTIFACTS = resolve('tests/artifacts');

/** Flags for Debian's Chromium as root, headless, with software WebGL and no background traffic. */
const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--use-angle=swiftshader',
  '--enable-unsafe-swiftshader',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

export interface E2eContext {
  ctx: TestContext;
  baseUrl: string;
  context: BrowserContext;
  page: Page;
  /** Every URL the page requested, to prove nothing left the origin. */
  requests: string[];
  close(): Promise<void>;
}

/** The real built app served on a free loopback port, and a fresh Chromium profile pointed at it. */
export async function startE2e(): Promise<E2eContext> {
  // PORELITH_DIST lets a run serve a client built into another folder; without it, the app's default (dist).
  const ctx = await startTestApp(process.env.PORELITH_DIST ? { PORELITH_DIST: process.env.PORELITH_DIST } : {});
  const server = createApp({ db: ctx.db, env: ctx.env, mailer: ctx.mailer, serveClient: true }).listen(0, '127.0.0.1');
  await new Promise<void>((r) => server.once('listening', () => r()));
  const baseUrl = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  const profile = mkdtempSync(join(tmpdir(), 'porelith-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: '/usr/bin/chromium',
    args: CHROMIUM_ARGS,
    viewport: { width: 1366, height: 800 },
  });
  const page = context.pages()[0] ?? (await context.newPage());
  const requests: string[] = [];
  page.on('request', (req) => requests.push(req.url()));
  mkdirSync(ARTIFACTS, { recursive: true });
  return {
    ctx,
    baseUrl,
    context,
    page,
    requests,
    async close() {
      await context.close();
      await new Promise<void>((r) => server.close(() => r()));
      await ctx.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

/** Requests that went anywhere but our own origin (data: and blob: URLs stay in the page). */
export function foreignRequests(requests: string[], baseUrl: string): string[] {
  return requests.filter((u) => !u.startsWith(baseUrl) && !u.startsWith('data:') && !u.startsWith('blob:'));
}
