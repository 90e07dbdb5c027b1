// Loads tenure's HTML report in Debian's Chromium (headless, driven over the DevTools protocol by
// playwright-core) and prints what a test needs to judge it, as JSON on standard output:
//   node tests/browser/check_report.mjs REPORT.html SHOT.png [SECTION_SHOTS_DIR]
//   {"console_errors": [], "page_errors": [], "requests": ["file:///.../REPORT.html"],
//    "charts": 14, "blank_charts": 0, "scripts": 0, "title": "...", "caution": true,
//    "page_height": 5200,
//    "screenshot": {"file": "SHOT.png", "width": 1280, "height": 2000, "colours": 913,
//                   "non_white": 0.41}}
// With SECTION_SHOTS_DIR it also saves one PNG per <section> (for a person to look at).
// The browser is /usr/bin/chromium unless TENURE_CHROMIUM names another; it gets a new, empty
// profile directory and no network-related background work.
import { chromium } from 'playwright-core';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { inflateSync } from 'node:zlib';

// Width, height, distinct colours and the share of pixels that are not white, of an 8-bit RGB or
// RGBA PNG (what Chromium writes), decoded here so the check needs no image library.
function pngStats(file) {
  const png = readFileSync(file);
  let offset = 8;
  let width = 0, height = 0, channels = 0;
  const idat = [];
  while (offset < png.length) {
    const length = png.readUInt32BE(offset);
    const type = png.toString('ascii', offset + 4, offset + 8);
    const data = png.subarray(offset + 8, offset + 8 + length);
    if (type === 'IHDR') {
      width = data.readUInt32BE(0);
      height = data.readUInt32BE(4);
      if (data[8] !== 8 || (data[9] !== 2 && data[9] !== 6)) throw new Error('unexpected PNG format');
      channels = data[9] === 6 ? 4 : 3;
    } else if (type === 'IDAT') {
      idat.push(data);
    }
    offset += 12 + length;
  }
  const raw = inflateSync(Buffer.concat(idat));
  const stride = width * channels;
  let previous = Buffer.alloc(stride);
  const colours = new Set();
  let nonWhite = 0;
  for (let y = 0; y < height; ++y) {
    const filter = raw[y * (stride + 1)];
    const line = Buffer.from(raw.subarray(y * (stride + 1) + 1, (y + 1) * (stride + 1)));
    for (let i = 0; i < stride; ++i) {
      const left = i >= channels ? line[i - channels] : 0;
      const up = previous[i];
      const upLeft = i >= channels ? previous[i - channels] : 0;
      let add = 0;
      if (filter === 1) add = left;
      else if (filter === 2) add = up;
      else if (filter === 3) add = (left + up) >> 1;
      else if (filter === 4) {
        const p = left + up - upLeft;
        const pa = Math.abs(p - left), pb = Math.abs(p - up), pc = Math.abs(p - upLeft);
        add = pa <= pb && pa <= pc ? left : pb <= pc ? up : upLeft;
      }
      line[i] = (line[i] + add) & 0xff;
    }
    for (let x = 0; x < width; ++x) {
      const r = line[x * channels], g = line[x * channels + 1], b = line[x * channels + 2];
      if (colours.size < 100000) colours.add((r << 16) | (g << 8) | b);
      if (r < 250 || g < 250 || b < 250) ++nonWhite;
    }
    previous = line;
  }
  return { file, width, height, colours: colours.size, non_white: nonWhite / (width * height) };
}

const [reportArg, shotArg, sectionsDir] = process.argv.slice(2);
if (!reportArg || !shotArg) {
  console.error('usage: node check_report.mjs REPORT.html SHOT.png [SECTION_SHOTS_DIR]');
  process.exit(2);
}
const reportUrl = pathToFileURL(resolve(reportArg)).href;
const profile = mkdtempSync(join(tmpdir(), 'tenure-chromium-'));
const result = { console_errors: [], page_errors: [], requests: [] };
const context = await chromium.launchPersistentContext(profile, {
  executablePath: process.env.TENURE_CHROMIUM || '/usr/bin/chromium',
  headless: true,
  viewport: { width: 1280, height: 2000 },
  args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run',
         '--disable-background-networking', '--disable-component-update', '--disable-sync'],
});
try {
  const page = context.pages()[0] ?? await context.newPage();
  page.on('console', (message) => {
    if (message.type() === 'error') result.console_errors.push(message.text());
  });
  page.on('pageerror', (error) => result.page_errors.push(String(error)));
  page.on('request', (request) => result.requests.push(request.url()));
  await page.goto(reportUrl, { waitUntil: 'load', timeout: 30000 });
  Object.assign(result, await page.evaluate(() => {
    const charts = [...document.querySelectorAll('svg.chart')];
    return {
      title: document.title,
      charts: charts.length,
      blank_charts: charts.filter((svg) => {
        const box = svg.getBoundingClientRect();
        // Data marks: lines, markers and bars, beyond the white background rectangle.
        const marks = svg.querySelectorAll('path, circle, rect').length - 1;
        return box.width < 100 || box.height < 80 || marks < 2;
      }).length,
      scripts: document.querySelectorAll('script').length,
      caution: document.body.innerText.includes('decision support, not tax, accounting or legal advice'),
      // How tall the page opens, in CSS pixels at the 1280-pixel-wide viewport.
      page_height: document.body.scrollHeight,
    };
  }));
  await page.screenshot({ path: shotArg });
  result.screenshot = pngStats(shotArg);
  if (sectionsDir) {
    const sections = await page.$$('main > section, main > header');
    for (let i = 0; i < sections.length; ++i) {
      await sections[i].screenshot({ path: join(sectionsDir, `section-${i}.png`) });
    }
  }
} finally {
  await context.close();
  rmSync(profile, { recursive: true, force: true });
}
console.log(JSON.stringify(result));
