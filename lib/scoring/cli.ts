/**
 * `npm run score -- <survey.json> [--format json|text] [--comparables <sales.json>] [--as-of <year>]`
 * Prints the graded report. Exit codes: 0 scored, 2 invalid input (each bad field listed),
 * 1 anything else (a message, never a stack trace). One of the two files in lib/scoring allowed to
 * touch the file system.
 */
import { readFileSync } from 'node:fs';
import { formatReportText } from './report-text';
import { safeScoreSurvey, type ScoreOptions } from './score-survey';
import type { ComparableSale } from './valuation/valuation-types';

const USAGE = 'usage: npm run score -- <survey.json> [--format json|text] [--comparables <sales.json>] [--as-of <year>]';

class InputError extends Error {}

interface CliArgs {
  file: string;
  format: 'json' | 'text';
  comparablesFile: string | null;
  asOfYear: number | null;
}

function parseArgs(argv: readonly string[]): CliArgs {
  let file: string | null = null;
  let format: 'json' | 'text' = 'json';
  let comparablesFile: string | null = null;
  let asOfYear: number | null = null;
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i]!;
    const value = () => {
      const v = argv[++i];
      if (v === undefined) throw new InputError(`${arg} needs a value`);
      return v;
    };
    if (arg === '--format') {
      const f = value();
      if (f !== 'json' && f !== 'text') throw new InputError(`--format must be json or text, not "${f}"`);
      format = f;
    } else if (arg.startsWith('--format=')) {
      const f = arg.slice('--format='.length);
      if (f !== 'json' && f !== 'text') throw new InputError(`--format must be json or text, not "${f}"`);
      format = f;
    } else if (arg === '--comparables') comparablesFile = value();
    else if (arg === '--as-of') {
      const y = Number(value());
      if (!Number.isInteger(y)) throw new InputError('--as-of needs a year');
      asOfYear = y;
    } else if (arg.startsWith('--')) throw new InputError(`unknown option ${arg}`);
    else if (file === null) file = arg;
    else throw new InputError(`unexpected argument ${arg}`);
  }
  if (file === null) throw new InputError('no survey file given');
  return { file, format, comparablesFile, asOfYear };
}

function readJson(path: string): unknown {
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch (e) {
    throw new InputError(`cannot read ${path}: ${(e as NodeJS.ErrnoException).code ?? 'read error'}`);
  }
  try {
    return JSON.parse(text);
  } catch (e) {
    throw new InputError(`${path} is not valid JSON: ${(e as Error).message}`);
  }
}

function main(argv: readonly string[]): number {
  let args: CliArgs;
  let survey: unknown;
  const options: ScoreOptions = {};
  try {
    args = parseArgs(argv);
    survey = readJson(args.file);
    if (args.comparablesFile) options.comparableSales = readJson(args.comparablesFile) as ComparableSale[];
    if (args.asOfYear !== null) options.asOfYear = args.asOfYear;
  } catch (e) {
    if (e instanceof InputError) {
      process.stderr.write(`${e.message}\n${USAGE}\n`);
      return 2;
    }
    throw e;
  }
  const outcome = safeScoreSurvey(survey, options);
  if (!outcome.ok) {
    process.stderr.write(`Invalid survey ${args.file}: ${outcome.issues.length} problem(s)\n`);
    for (const issue of outcome.issues) process.stderr.write(`  ${issue.path || '(root)'}: ${issue.message}\n`);
    return 2;
  }
  process.stdout.write(args.format === 'text' ? `${formatReportText(outcome.result)}\n` : `${JSON.stringify(outcome.result, null, 2)}\n`);
  return 0;
}

try {
  process.exitCode = main(process.argv.slice(2));
} catch (e) {
  process.stderr.write(`scoring failed: ${e instanceof Error ? e.message : String(e)}\n`);
  process.exitCode = 1;
}
