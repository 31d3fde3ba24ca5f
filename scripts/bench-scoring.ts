/**
 * `npm run bench:scoring`: scores the example surveys in lib/scoring/examples over and over and
 * prints surveys per second and the median time per survey. Target: under 0.1 ms per full survey.
 * Reading the examples is the only file access; the scoring itself is pure. Each survey goes
 * through scoreSurvey as the app submits it, validation included, and every call gets an object of
 * its own, deep-copied just before it is scored (the copying is not timed), as every submit brings
 * a body parsed a moment before: nothing can be carried over from an earlier call with the same
 * object. Copies made long in advance would instead be measured cold in the CPU cache, which no
 * submit is.
 *
 * `--json` adds one last line for other scripts (npm run bench): a JSON object with
 * medianMs, surveysPerSecond, cpuUsPerSurvey, bestMs, worstMs, targetMs, met, load1 and cores.
 * Those names and units stay as they are; new fields may be added.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { availableParallelism, loadavg } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { scoreSurvey } from '../lib/scoring/index';

const TARGET_MS = 0.1;
const EXAMPLES_DIR = fileURLToPath(new URL('../lib/scoring/examples/', import.meta.url));
const asJson = process.argv.includes('--json');

const examples = readdirSync(EXAMPLES_DIR)
  .filter((f) => f.endsWith('.json'))
  .sort()
  .map((f) => ({ name: f, survey: JSON.parse(readFileSync(join(EXAMPLES_DIR, f), 'utf8')) as unknown }));

// Many short rounds rather than a few long ones: on a shared machine a round the scheduler
// interrupts is an outlier the median sets aside, where a long round would absorb every interruption.
const ROUNDS = 201;
const PER_ROUND = 30;

let wallNs = 0n;
let cpuUs = 0;
/** Scores a fresh copy of every example, timing the scoring only; returns the checks counted. */
const scoreBatch = () => {
  const copies = examples.map((e) => structuredClone(e.survey));
  let checks = 0;
  const cpu0 = process.cpuUsage();
  const t0 = process.hrtime.bigint();
  for (const survey of copies) checks += scoreSurvey(survey).checks.length;
  wallNs += process.hrtime.bigint() - t0;
  const cpu = process.cpuUsage(cpu0);
  cpuUs += cpu.user + cpu.system;
  return checks;
};

// Warm-up so the JIT has compiled the hot paths before timing.
for (let i = 0; i < 70 * PER_ROUND; i++) scoreBatch();

const perSurveyMs: number[] = [];
let sink = 0;
wallNs = 0n;
cpuUs = 0;
for (let round = 0; round < ROUNDS; round++) {
  const before = wallNs;
  for (let i = 0; i < PER_ROUND; i++) sink += scoreBatch();
  perSurveyMs.push(Number(wallNs - before) / 1e6 / (PER_ROUND * examples.length));
}
// Time spent scoring only (the copies between batches left out).
const totalMs = Number(wallNs) / 1e6;
const scored = ROUNDS * PER_ROUND * examples.length;
// CPU time alongside wall time: on a shared machine the wall clock also counts time spent waiting for a core.
const cpuMsPerSurvey = cpuUs / 1000 / scored;
perSurveyMs.sort((a, b) => a - b);
const median = perSurveyMs[Math.floor(perSurveyMs.length / 2)]!;
const best = perSurveyMs[0]!;
const worst = perSurveyMs[perSurveyMs.length - 1]!;
const surveysPerSecond = Math.round(scored / (totalMs / 1000));
const load1 = loadavg()[0]!;
const cores = availableParallelism();

const lines = [
  `examples: ${examples.map((s) => s.name).join(', ')} (a fresh copy for every call; ${PER_ROUND} of each per round)`,
  `scored ${scored} surveys in ${totalMs.toFixed(0)} ms of scoring (checksum ${sink})`,
  `surveys per second: ${surveysPerSecond}`,
  `median time per survey: ${(median * 1000).toFixed(1)} µs (${median.toFixed(4)} ms; best round ${best.toFixed(4)} ms, worst ${worst.toFixed(4)} ms)`,
  `CPU time per survey (mean): ${(cpuMsPerSurvey * 1000).toFixed(1)} µs`,
  `load average (1 min): ${load1.toFixed(1)} on ${cores} cores${load1 > cores ? ' — machine busy, wall times include waiting for a core' : ''}`,
  `target < ${TARGET_MS} ms per survey: ${median < TARGET_MS ? 'met' : 'NOT met'}`,
];
if (asJson) {
  lines.push(
    JSON.stringify({
      medianMs: Number(median.toFixed(5)),
      surveysPerSecond,
      cpuUsPerSurvey: Number((cpuMsPerSurvey * 1000).toFixed(2)),
      bestMs: Number(best.toFixed(5)),
      worstMs: Number(worst.toFixed(5)),
      targetMs: TARGET_MS,
      met: median < TARGET_MS,
      load1: Number(load1.toFixed(2)),
      cores,
    }),
  );
}
process.stdout.write(lines.join('\n') + '\n');
