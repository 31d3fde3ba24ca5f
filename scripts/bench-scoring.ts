/**
 * `npm run bench:scoring`: scores the example surveys in lib/scoring/examples over and over and
 * prints surveys per second and the median time per survey. Target: under 0.1 ms per full survey.
 * Reading the examples is the only file access; the scoring itself is pure. Each survey goes
 * through scoreSurvey as the app submits it, validation included, and every call gets an object of
 * its own (a deep copy made before timing), as every submit brings a freshly parsed body: nothing
 * can be carried over from an earlier call with the same object.
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

// One distinct copy of every example for each call within a round.
const pool = Array.from({ length: PER_ROUND }, () => examples.map((e) => structuredClone(e.survey)));
const scoreRound = () => {
  let checks = 0;
  for (const copies of pool) for (const survey of copies) checks += scoreSurvey(survey).checks.length;
  return checks;
};

// Warm-up so the JIT has compiled the hot paths before timing.
for (let i = 0; i < 70; i++) scoreRound();

const perSurveyMs: number[] = [];
let sink = 0;
const cpuStart = process.cpuUsage();
const start = process.hrtime.bigint();
for (let round = 0; round < ROUNDS; round++) {
  const t0 = process.hrtime.bigint();
  sink += scoreRound();
  const t1 = process.hrtime.bigint();
  perSurveyMs.push(Number(t1 - t0) / 1e6 / (PER_ROUND * examples.length));
}
const totalMs = Number(process.hrtime.bigint() - start) / 1e6;
const cpu = process.cpuUsage(cpuStart);
const scored = ROUNDS * PER_ROUND * examples.length;
// CPU time alongside wall time: on a shared machine the wall clock also counts time spent waiting for a core.
const cpuMsPerSurvey = (cpu.user + cpu.system) / 1000 / scored;
perSurveyMs.sort((a, b) => a - b);
const median = perSurveyMs[Math.floor(perSurveyMs.length / 2)]!;
const best = perSurveyMs[0]!;
const worst = perSurveyMs[perSurveyMs.length - 1]!;
const surveysPerSecond = Math.round(scored / (totalMs / 1000));
const load1 = loadavg()[0]!;
const cores = availableParallelism();

const lines = [
  `examples: ${examples.map((s) => s.name).join(', ')} (${PER_ROUND} copies of each per round)`,
  `scored ${scored} surveys in ${totalMs.toFixed(0)} ms (checksum ${sink})`,
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
