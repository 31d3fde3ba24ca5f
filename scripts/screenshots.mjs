// npm run screenshots: the README's pictures of the main screens, taken by the browser test
// tests/e2e/readme-screenshots.test.ts on a fresh demo database (the same stack as `npm test`, so it
// can run beside `npm start`), then optimised into docs/screenshots/ (palette PNG, under 300 KB each).
// Options: --no-build (reuse the last build in this offset's build folder).
import { existsSync, mkdirSync, readdirSync, statSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import sharp from 'sharp';
import { bringUpTestStack, buildApp, NEXT_DIST_DIR, root, startApp } from './lib/stack.mjs';
import { run, waitForHttp } from './lib/processes.mjs';

const RAW_DIR = path.join(root, 'tmp', 'screenshots', 'readme');
const OUT_DIR = path.join(root, 'docs', 'screenshots');
const MAX_BYTES = 300 * 1024;
const EXPECTED = ['landing', 'survey-phone', 'report-page', 'report-pdf-cover', 'comparison-table'];

/** A palette PNG (256 colours, dithered) at most `width` wide; narrower until it fits the size limit. */
async function optimise(input, output) {
  const { width } = await sharp(input).metadata();
  for (let target = Math.min(width, 1600); target >= 600; target = Math.round(target * 0.85)) {
    const png = await sharp(input)
      .resize({ width: target, withoutEnlargement: true })
      .png({ palette: true, colours: 256, dither: 0.6, effort: 10, compressionLevel: 9 })
      .toBuffer();
    if (png.byteLength <= MAX_BYTES) {
      writeFileSync(output, png);
      return { width: target, bytes: png.byteLength };
    }
  }
  throw new Error(`${path.basename(input)} does not fit in ${MAX_BYTES / 1024} KB even at 600 px wide`);
}

let stack;
let exitCode = 1;
try {
  let env;
  ({ stack, env } = await bringUpTestStack());
  if (!process.argv.includes('--no-build') || !existsSync(path.join(root, NEXT_DIST_DIR, 'BUILD_ID'))) {
    await buildApp({ ...env, NODE_ENV: 'production' });
  }
  const app = startApp(stack.group, env, stack.ports.app);
  await waitForHttp(stack.appUrl, { child: app, name: 'app' });
  await run(process.execPath, ['node_modules/vitest/vitest.mjs', 'run', '--project', 'e2e', 'tests/e2e/readme-screenshots.test.ts'], { cwd: root, env });

  mkdirSync(OUT_DIR, { recursive: true });
  const taken = readdirSync(RAW_DIR).filter((f) => f.endsWith('.png'));
  const missing = EXPECTED.filter((name) => !taken.includes(`${name}.png`));
  if (missing.length) throw new Error(`The browser test did not take: ${missing.join(', ')}`);
  for (const name of EXPECTED) {
    const { width, bytes } = await optimise(path.join(RAW_DIR, `${name}.png`), path.join(OUT_DIR, `${name}.png`));
    const before = statSync(path.join(RAW_DIR, `${name}.png`)).size;
    console.log(`docs/screenshots/${name}.png  ${width} px wide, ${Math.round(bytes / 1024)} KB (taken ${Math.round(before / 1024)} KB)`);
  }
  exitCode = 0;
} catch (error) {
  console.error(error instanceof Error ? error.message : error);
} finally {
  if (stack) await stack.stop();
  process.exit(exitCode);
}
