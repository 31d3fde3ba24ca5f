/**
 * `npm run bench:scoring`: scores the example surveys in lib/scoring/examples over and over and
 * prints surveys per second and the median time per survey. Target: under 0.1 ms per full survey.
 * Reading the examples is the only file access; the scoring itself is pure. Each survey goes
 * through scoreSurvey as the app submits it, validation included.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { availableParallelism, loadavg } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { scoreSurvey } from '../lib/scoring/index';

const TARGET_MS = 0.1;
const EXAMPLES_DIR = fileURLToPath(new URL('../lib/scoring/examples/', import.meta.url));

const surveys = readdirSync(EXAMPLES_DIR)
  .filter((f) => f.endsWith('.json'))
  .sort()
  .map((f) => ({ name: f, survey: JSON.parse(readFileSync(join(EXAMPLES_DIR, f), 'utf8')) as unknown }));

// Warm-up so the JIT has compiled the hot paths before timing.
for (let i = 0; i < 2000; i++) for (const s of surveys) scoreSurvey(s.survey);

// Many short rounds rather than a few long ones: on a shared machine a round the scheduler
// interrupts is an outlier the median sets aside, where a long round would absorb every interruption.
const ROUNDS = 201;
const PER_ROUND = 30;
const perSurveyMs: number[] = [];
let sink = 0;
const cpuStart = process.cpuUsage();
const start = process.hrtime.bigint();
for (let round = 0; round < ROUNDS; round++) {
  const t0 = process.hrtime.bigint();
  for (let i = 0; i < PER_ROUND; i++) for (const s of surveys) sink += scoreSurvey(s.survey).checks.length;
  const t1 = process.hrtime.bigint();
  perSurveyMs.push(Number(t1 - t0) / 1e6 / (PER_ROUND * surveys.length));
}
const totalMs = Number(process.hrtime.bigint() - start) / 1e6;
const cpu = process.cpuUsage(cpuStart);
// CPU time alongside wall time: on a shared machine the wall clock also counts time spent waiting for a core.
const cpuMsPerSurvey = (cpu.user + cpu.system) / 1000 / (ROUNDS * PER_ROUND * surveys.length);
const scored = ROUNDS * PER_ROUND * surveys.length;
perSurveyMs.sort((a, b) => a - b);
const median = perSurveyMs[Math.floor(perSurveyMs.length / 2)]!;

process.stdout.write(
  [
    `examples: ${surveys.map((s) => s.name).join(', ')}`,
    `scored ${scored} surveys in ${totalMs.toFixed(0)} ms (checksum ${sink})`,
    `surveys per second: ${Math.round(scored / (totalMs / 1000))}`,
    `median time per survey: ${(median * 1000).toFixed(1)} µs (${median.toFixed(4)} ms; best round ${perSurveyMs[0]!.toFixed(4)} ms, worst ${perSurveyMs[perSurveyMs.length - 1]!.toFixed(4)} ms)`,
    `CPU time per survey (mean): ${(cpuMsPerSurvey * 1000).toFixed(1)} µs`,
    `load average (1 min): ${loadavg()[0]!.toFixed(1)} on ${availableParallelism()} cores${loadavg()[0]! > availableParallelism() ? ' — machine busy, wall times include waiting for a core' : ''}`,
    `target < ${TARGET_MS} ms per survey: ${median < TARGET_MS ? 'met' : 'NOT met'}`,
  ].join('\n') + '\n',
);
