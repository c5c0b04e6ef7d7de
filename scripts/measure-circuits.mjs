// Server memory per open member page (one Blazor circuit each), in headless Debian Chromium driven by
// playwright-core. Reads the server process's memory from /proc before and after opening the pages.
// Usage: node scripts/measure-circuits.mjs <base-url> <app-console-log> <server-pid> <pages>
// Normally run through scripts/measure-circuits.sh. Not part of the test suite.
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';

const nodeDir = process.env.SHOTS_NODE_DIR ?? '/tmp/shots-node';
const { chromium } = createRequire(path.join(nodeDir, 'package.json'))('playwright-core');
const [baseUrl, appLog, pidArg, pagesArg] = process.argv.slice(2);
const pid = Number(pidArg);
const count = Number(pagesArg ?? 20);

function demoSignIns(logText) {
  const found = {};
  for (const line of logText.split('\n')) {
    const m = line.match(/^\s+(\w+)\s+(\S+@\S+)\s+password:\s+(\S+)\s*$/);
    if (m) found[m[1]] = { email: m[2], password: m[3] };
  }
  return found;
}

// RSS and private dirty memory of the server process, in MB.
function memory() {
  const status = readFileSync(`/proc/${pid}/status`, 'utf8');
  const rssKb = Number(status.match(/VmRSS:\s+(\d+) kB/)[1]);
  const rollup = readFileSync(`/proc/${pid}/smaps_rollup`, 'utf8');
  const dirtyKb = Number(rollup.match(/Private_Dirty:\s+(\d+) kB/)[1]);
  return { rss: rssKb / 1024, dirty: dirtyKb / 1024 };
}

const sleep = (ms) => new Promise((r) => setTimeout(r, ms));
// Memory settles a while after the last page: take the lowest of a few readings 2 s apart.
async function settledMemory() {
  let best = null;
  for (let i = 0; i < 5; i++) {
    await sleep(2000);
    const m = memory();
    if (!best || m.rss < best.rss) best = m;
  }
  return best;
}

const who = demoSignIns(readFileSync(appLog, 'utf8')).Designer;
if (!who) throw new Error('no demo Designer sign-in in the app log (was it started with --demo?)');

const browser = await chromium.launch({
  executablePath: process.env.CHROMIUM ?? '/usr/bin/chromium',
  headless: true,
  args: ['--no-sandbox', '--disable-gpu', '--disable-dev-shm-usage', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
});
try {
  const context = await browser.newContext({ viewport: { width: 1400, height: 900 } });
  const first = await context.newPage();
  first.setDefaultTimeout(60000);
  await first.goto(`${baseUrl}/account/signin`);
  await first.fill('#signin-email', who.email);
  await first.fill('#signin-password', who.password);
  await Promise.all([first.waitForURL((u) => !u.pathname.startsWith('/account/signin')), first.click('[data-testid=signin-submit]')]);
  await first.goto(`${baseUrl}/projects`);
  await first.click('[data-testid=project-link]');
  await first.click('[data-testid=truss-open]');
  await first.waitForSelector('[data-testid=member-link]');
  const links = await first.$$eval('[data-testid=member-link]', (as) => as.map((a) => a.getAttribute('href')));
  // Warm-up: one member page open, its circuit alive, the code paths jitted.
  await first.goto(`${baseUrl}${links[0]}`);
  await first.waitForSelector('[data-testid=member-utilization]');
  await first.waitForLoadState('networkidle');
  const before = await settledMemory();

  const opened = [];
  for (let i = 0; i < count; i++) {
    const page = await context.newPage();
    page.setDefaultTimeout(60000);
    await page.goto(`${baseUrl}${links[(i + 1) % links.length]}`);
    await page.waitForSelector('[data-testid=member-utilization]');
    await page.waitForLoadState('networkidle');
    opened.push(page);
  }
  const after = await settledMemory();
  const perRss = (after.rss - before.rss) / count;
  const perDirty = (after.dirty - before.dirty) / count;
  console.log(`server RSS with 1 member page open: ${before.rss.toFixed(1)} MB (private dirty ${before.dirty.toFixed(1)} MB)`);
  console.log(`server RSS with ${count + 1} member pages open: ${after.rss.toFixed(1)} MB (private dirty ${after.dirty.toFixed(1)} MB)`);
  console.log(`per open member page: ${perRss.toFixed(2)} MB RSS, ${perDirty.toFixed(2)} MB private dirty (target < 5 MB)`);
} finally {
  await browser.close();
}
