import { existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import { afterAll, describe, expect, it } from 'vitest';
import { MAIN_PAGES, SURVEY_FIRST_LOAD_BUDGET_KB, firstLoadJs } from '../../scripts/lib/first-load-js';

// The build the app under test was started from (scripts/test.mjs builds before the integration tests).
const distDir = path.resolve(process.env.NEXT_DIST_DIR ?? '.next');
const SURVEY_ROUTE = MAIN_PAGES.find((p) => p.budgetKb)!.route;

/** A build folder of our own: one route whose manifests name a framework file and a page chunk. */
function plantBuild(dir: string, chunks: Record<string, string>) {
  const serverDir = path.join(dir, 'server', 'app', 'jobs', 'page');
  mkdirSync(serverDir, { recursive: true });
  mkdirSync(path.join(dir, 'static', 'chunks'), { recursive: true });
  for (const [file, text] of Object.entries(chunks)) writeFileSync(path.join(dir, file), text);
  writeFileSync(path.join(serverDir, 'build-manifest.json'), JSON.stringify({ rootMainFiles: ['static/chunks/main.js'] }));
  writeFileSync(
    `${serverDir}_client-reference-manifest.js`,
    `globalThis.__RSC_MANIFEST=(globalThis.__RSC_MANIFEST||{});globalThis.__RSC_MANIFEST["/jobs/page"] = ${JSON.stringify({
      entryJSFiles: { '[project]/app/layout': ['static/chunks/main.js'], '[project]/app/jobs/page': ['static/chunks/page.js'] },
    })};`,
  );
}

describe('the survey page’s first-load JavaScript', () => {
  const planted = mkdtempSync(path.join(tmpdir(), 'waygrade-first-load-'));
  afterAll(() => rmSync(planted, { recursive: true, force: true }));

  it('counts every entry chunk once, gzipped, and leaves out chunks loaded later', () => {
    const main = 'self.main=' + 'framework;'.repeat(500);
    const page = 'self.page=' + Array.from({ length: 4000 }, (_, i) => i.toString(36)).join(',');
    plantBuild(planted, { 'static/chunks/main.js': main, 'static/chunks/page.js': page, 'static/chunks/later.js': 'self.later=' + 'x'.repeat(90_000) });
    const measured = firstLoadJs(planted, '/jobs/page');
    expect(measured.files).toEqual(['static/chunks/main.js', 'static/chunks/page.js']);
    // Reference: Node's own gzip of the two files, summed.
    expect(measured.kb * 1024).toBe(gzipSync(main).byteLength + gzipSync(page).byteLength);
  });

  it(`stays within ${SURVEY_FIRST_LOAD_BUDGET_KB} KB gzip (the survey's first-load budget) in the build under test`, () => {
    expect(existsSync(path.join(distDir, 'BUILD_ID')), `no build at ${distDir}`).toBe(true);
    const { files, kb } = firstLoadJs(distDir, SURVEY_ROUTE);
    expect(files.length).toBeGreaterThan(3);
    expect(kb, `survey page first-load JS is ${kb.toFixed(1)} KB gzip in ${files.length} files`).toBeLessThanOrEqual(SURVEY_FIRST_LOAD_BUDGET_KB);
  });

  it('leaves the photo uploader and the survey-format validator out of the first load', () => {
    // Markers: the header uploadthing's client sends with every request, and zod's error class name
    // (kept by the minifier because zod sets it as a string).
    const firstLoad = firstLoadJs(distDir, SURVEY_ROUTE).files.map((file) => readFileSync(path.join(distDir, file), 'utf8')).join('\n');
    expect(firstLoad).not.toContain('x-uploadthing-package');
    expect(firstLoad).not.toContain('ZodError');
  });
});
