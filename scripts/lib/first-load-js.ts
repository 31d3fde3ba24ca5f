import { readFileSync } from 'node:fs';
import path from 'node:path';
import { gzipSync } from 'node:zlib';

/** Issue #8's budget: what a phone downloads before the survey screen works, gzipped. */
export const SURVEY_FIRST_LOAD_BUDGET_KB = 170;

/** The main pages by their route in the build (app folder path plus /page); the survey carries the budget. */
export const MAIN_PAGES: ReadonlyArray<{ label: string; route: string; budgetKb?: number }> = [
  { label: 'Landing', route: '/page' },
  { label: 'Sign in', route: '/(auth)/sign-in/page' },
  { label: 'Overview', route: '/(backoffice)/dashboard/page' },
  { label: 'Machine listing form', route: '/(backoffice)/machines/new/page' },
  { label: 'Survey (phone)', route: '/(backoffice)/jobs/[inspectionId]/survey/page', budgetKb: SURVEY_FIRST_LOAD_BUDGET_KB },
  { label: 'Report', route: '/(backoffice)/reports/[id]/page' },
  { label: 'Comparison table', route: '/(backoffice)/compare/page' },
];

export interface FirstLoadJs {
  /** The script files, relative to the build folder. */
  files: string[];
  /** Their size gzipped (level 6, as a web server sends them), in KB of 1024 bytes. */
  kb: number;
}

/**
 * The JavaScript a first visit to a page downloads, read from a `next build` output folder: the
 * framework's main files (the route's build-manifest.json) and every chunk its layouts and page name
 * as entries (its client reference manifest). Chunks loaded later with import() are not entries, so
 * they are not counted.
 */
export function firstLoadJs(distDir: string, route: string): FirstLoadJs {
  const serverDir = path.join(distDir, 'server', 'app', ...route.split('/').filter(Boolean));
  const buildManifest = JSON.parse(readFileSync(path.join(serverDir, 'build-manifest.json'), 'utf8')) as { rootMainFiles: string[] };
  const reference = readFileSync(`${serverDir}_client-reference-manifest.js`, 'utf8');
  const entries = JSON.parse(reference.slice(reference.indexOf('= {') + 2).replace(/;\s*$/, '')) as { entryJSFiles: Record<string, string[]> };
  const files = [...new Set([...buildManifest.rootMainFiles, ...Object.values(entries.entryJSFiles).flat()])];
  let gzip = 0;
  for (const file of files) gzip += gzipSync(readFileSync(path.join(distDir, file))).byteLength;
  return { files, kb: gzip / 1024 };
}
