// Screenshots of the main pages and a browser timing of "save a member edit -> updated result on the page",
// for the demo truss, in headless Debian Chromium driven by playwright-core. Not part of the test suite.
// Usage: node scripts/screenshots.mjs <base-url> <app-console-log> [output-dir]
// The demo sign-ins are parsed from the app's console output (demo mode prints them at start).
// Normally run through scripts/screenshots.sh, which installs playwright-core, starts the app and stops it.
import { readFileSync, mkdirSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';

// ES modules ignore NODE_PATH: playwright-core is loaded from SHOTS_NODE_DIR (set by screenshots.sh),
// a temp folder outside the repository.
const nodeDir = process.env.SHOTS_NODE_DIR ?? '/tmp/shots-node';
const { chromium } = createRequire(path.join(nodeDir, 'package.json'))('playwright-core');

const [baseUrl, appLog, outArg] = process.argv.slice(2);
if (!baseUrl || !appLog) {
  console.error('usage: node screenshots.mjs <base-url> <app-console-log> [output-dir]');
  process.exit(2);
}
const outDir = outArg ?? path.join(path.dirname(new URL(import.meta.url).pathname), '..', 'docs', 'screenshots');
mkdirSync(outDir, { recursive: true });

// Lines like "  Designer      designer@demo.trussweb.local      password: ..."
function demoSignIns(logText) {
  const found = {};
  for (const line of logText.split('\n')) {
    const m = line.match(/^\s+(\w+)\s+(\S+@\S+)\s+password:\s+(\S+)\s*$/);
    if (m) found[m[1]] = { email: m[2], password: m[3] };
  }
  return found;
}
const signIns = demoSignIns(readFileSync(appLog, 'utf8'));
for (const role of ['Designer', 'Administrator']) {
  if (!signIns[role]) throw new Error(`no demo sign-in for ${role} in ${appLog} (was the app started with --demo?)`);
}

const browser = await chromium.launch({
  executablePath: process.env.CHROMIUM ?? '/usr/bin/chromium',
  headless: true,
  args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run',
    '--disable-background-networking', '--disable-component-update', '--disable-sync'],
});

const shot = async (page, name) => {
  const file = path.join(outDir, name);
  await page.screenshot({ path: file, fullPage: false });
  console.log(`screenshot ${file}`);
};

// Interactive server pages: wait until the network is quiet (circuit up, first render done) and MudBlazor
// progress bars are gone.
async function settle(page) {
  await page.waitForLoadState('networkidle');
  await page.waitForFunction(() => !document.querySelector('.mud-progress-linear, [data-testid$="-loading"]'), null, { timeout: 30000 });
}

async function signIn(context, who) {
  const page = await context.newPage();
  await page.goto(`${baseUrl}/account/signin`);
  await page.waitForSelector('#signin-email');
  await page.fill('#signin-email', who.email);
  await page.fill('#signin-password', who.password);
  await Promise.all([
    page.waitForURL((u) => !u.pathname.startsWith('/account/signin'), { timeout: 30000 }),
    page.click('[data-testid=signin-submit]'),
  ]);
  return page;
}

const median = (xs) => {
  const s = [...xs].sort((a, b) => a - b);
  const n = s.length;
  return n % 2 ? s[(n - 1) / 2] : (s[n / 2 - 1] + s[n / 2]) / 2;
};

try {
  const viewport = { width: 1400, height: 900 };

  // Sign-in page, signed out.
  {
    const context = await browser.newContext({ viewport });
    const page = await context.newPage();
    await page.goto(`${baseUrl}/account/signin`);
    await page.waitForSelector('[data-testid=signin-submit]');
    await page.waitForLoadState('networkidle');
    await shot(page, 'signin.png');
    await context.close();
  }

  // The demo designer: projects, project, truss, member, sections, then the timing.
  let timings = [];
  {
    const context = await browser.newContext({ viewport });
    const page = await signIn(context, signIns.Designer);

    await page.goto(`${baseUrl}/projects`);
    await page.waitForSelector('[data-testid=project-link]');
    await settle(page);
    await shot(page, 'projects.png');

    await page.click('[data-testid=project-link]');
    await page.waitForURL(/\/projects\/[0-9a-f-]{36}/);
    await page.waitForSelector('[data-testid=project-title]');
    await page.waitForSelector('a[href^="/trusses/"]');
    await settle(page);
    await shot(page, 'project.png');

    const trussHref = await page.getAttribute('a[href^="/trusses/"]', 'href');
    const trussId = trussHref.split('/').pop();
    await page.goto(`${baseUrl}/trusses/${trussId}`);
    await page.waitForSelector('[data-testid=truss-title]');
    // Plotly has drawn when the elevation holds its SVG with member traces.
    await page.waitForFunction(() => document.querySelectorAll('[data-testid=truss-elevation] .main-svg .scatterlayer path').length > 0, null, { timeout: 30000 })
      .catch(async (e) => { await shot(page, 'truss-failed.png'); throw e; });
    await page.waitForSelector('[data-testid=member-link]');
    await settle(page);
    await shot(page, 'truss.png');

    // A web or chord member from the results table. Single sections, so the screenshot shows the section
    // drawing and resistance curve (a double-angle member page shows a note there instead; it renders, and
    // tests/TrussWeb.E2E/ReviewJourneyTests opens one).
    const memberHref = await page.evaluate(() => {
      const rows = [...document.querySelectorAll('[data-testid=member-results] tr')]
        .map((tr) => ({ link: tr.querySelector('[data-testid=member-link]'), cells: [...tr.querySelectorAll('td')].map((td) => td.innerText.trim()) }))
        .filter((r) => r.link && r.cells.length > 2);
      const pick = rows.find((r) => /web|chord/i.test(r.cells[1]) && !/^2L/i.test(r.cells[2]))
        ?? rows.find((r) => !/^2L/i.test(r.cells[2]));
      if (!pick) throw new Error('no single-section member in the results table');
      return pick.link.getAttribute('href');
    });
    const memberUrl = `${baseUrl}${memberHref}?truss=${trussId}`;
    await page.goto(memberUrl);
    await page.waitForSelector('[data-testid=member-utilization], [data-testid=member-failure], [data-testid=member-error]', { timeout: 30000 });
    if (!(await page.$('[data-testid=member-utilization]'))) {
      throw new Error(`member page ${memberUrl}: ${(await page.evaluate(() => document.body.innerText)).slice(0, 800)}`);
    }
    await page.waitForSelector('[data-testid=picker-row]');
    await settle(page);
    await shot(page, 'member.png');

    if (await page.$('[data-testid=member-readonly]')) throw new Error('the demo designer cannot edit this member');

    // Two sections of the member's family other than its own, with different masses.
    const current = (await page.textContent('[data-testid=member-section]')).trim();
    const [sectionA, sectionB] = await page.evaluate((cur) => {
      const rows = [...document.querySelectorAll('[data-testid=picker-row]')]
        .map((r) => ({ d: r.dataset.designation, m: r.querySelector('[data-testid=picker-mass]')?.textContent }))
        .filter((r) => r.d && r.d.toLowerCase() !== cur.toLowerCase());
      const a = rows[Math.floor(rows.length / 2)] ?? rows[0];
      const b = rows.find((r) => r.m !== a.m && r.d !== a.d);
      return [a.d, b.d];
    }, current);
    console.log(`member ${memberHref}: section ${current}; timing alternates ${sectionA} / ${sectionB}`);

    for (let i = 0; i < 5; i++) {
      const designation = i % 2 === 0 ? sectionA : sectionB;
      await page.click(`[data-testid=picker-row][data-designation="${designation}"] [data-testid=picker-choose]`);
      await page.waitForSelector('[data-testid=member-save]:not([disabled])');
      // Clicked and timed inside the page: from the click to the utilization text changing.
      const ms = await page.evaluate(() => new Promise((resolve, reject) => {
        const util = () => document.querySelector('[data-testid=member-utilization]')?.textContent?.trim();
        const before = util();
        const timer = setTimeout(() => { observer.disconnect(); reject(new Error(`utilization stayed ${before}`)); }, 60000);
        const observer = new MutationObserver(() => {
          const now = util();
          if (now !== undefined && now !== before) {
            const elapsed = performance.now() - t0;
            observer.disconnect();
            clearTimeout(timer);
            resolve(elapsed);
          }
        });
        observer.observe(document.body, { subtree: true, childList: true, characterData: true });
        const t0 = performance.now();
        document.querySelector('[data-testid=member-save]').click();
      }));
      const shown = (await page.textContent('[data-testid=member-utilization]')).trim();
      timings.push(ms);
      console.log(`save ${i + 1}: ${designation} -> utilization ${shown} in ${ms.toFixed(0)} ms`);
      // Let the save finish (button back to its idle label) before the next edit.
      await page.waitForFunction(() => !/Saving/.test(document.querySelector('[data-testid=member-save]')?.textContent ?? ''));
      await page.waitForLoadState('networkidle');
    }
    console.log(`member edit to updated result (ms): ${timings.map((t) => t.toFixed(0)).join(', ')}; median ${median(timings).toFixed(0)}`);

    await page.goto(`${baseUrl}/sections`);
    await page.waitForSelector('table tbody tr');
    await settle(page);
    await shot(page, 'sections.png');
    await context.close();
  }

  // The demo administrator: /admin.
  {
    const context = await browser.newContext({ viewport });
    const page = await signIn(context, signIns.Administrator);
    await page.goto(`${baseUrl}/admin`);
    await page.waitForSelector('[data-testid=admin-tabs]');
    await page.waitForSelector('[data-testid=admin-tabs] table tbody tr');
    await settle(page);
    await shot(page, 'admin.png');
    await context.close();
  }
} finally {
  await browser.close();
}
