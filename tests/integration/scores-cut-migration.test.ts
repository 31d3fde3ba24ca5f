import { readFileSync } from 'node:fs';
import path from 'node:path';
import mysql from 'mysql2/promise';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PrivateDatabase } from '../support/private-stack';

// Migration 0014 on a database of its own (it lifts and restores a trigger, which must not touch the
// shared test database while other tests run): the demo data, its scores set back to the rounded
// figures earlier versions stored, then the migration's statements as the migrator runs them.
const MIGRATION = path.resolve(import.meta.dirname, '../../db/migrations/0014_scores_cut_not_rounded.sql');

describe('migration 0014: stored scores cut, not rounded', () => {
  const database = new PrivateDatabase(`scores_${process.pid}`);
  let sql: mysql.Connection;

  const rows = async <T>(query: string) => (await sql.query(query))[0] as T[];

  beforeAll(async () => {
    await database.start();
    database.migrate();
    database.runScript('db/seed/index.ts');
    sql = await mysql.createConnection({ uri: database.url, timezone: 'Z' });
    // As stored before: rounded to whole points (the guard on released reports lifted to write them back).
    database.sql(`USE \`${database.name}\`;
      DROP TRIGGER reports_released_immutable;
      UPDATE reports SET overall_score = ROUND(JSON_VALUE(result, '$.overall.score'));
      UPDATE report_subsystem_scores s INNER JOIN reports r ON r.id = s.report_id
        INNER JOIN JSON_TABLE(r.result, '$.subsystems[*]' COLUMNS (id VARCHAR(40) PATH '$.id', score DOUBLE PATH '$.score')) j
        ON CAST(j.id AS BINARY) = CAST(s.subsystem AS BINARY)
        SET s.score = ROUND(j.score) WHERE j.score IS NOT NULL;`);
    for (const statement of readFileSync(MIGRATION, 'utf8').split('--> statement-breakpoint')) await sql.query(statement);
  }, 300_000);

  afterAll(async () => {
    await sql?.end().catch(() => {});
    await database.remove();
  }, 120_000);

  it('takes each report’s overall score again from its result, cut to whole points, and the table follows', async () => {
    const reports = await rows<{ id: number; stored: number; raw: string; listed: number | null; status: string }>(
      `SELECT r.id, r.overall_score AS stored, JSON_VALUE(r.result, '$.overall.score') AS raw, e.overall_score AS listed, r.status
       FROM reports r LEFT JOIN comparison_entries e ON e.report_id = r.id`,
    );
    expect(reports.length).toBeGreaterThan(10);
    // The demo data holds scores with a fraction of a half or more, which rounding had lifted.
    expect(reports.filter((r) => Number(r.raw) % 1 >= 0.5).length).toBeGreaterThan(0);
    for (const r of reports) {
      expect(r.stored, `report ${r.id}`).toBe(Math.floor(Number(r.raw)));
      if (r.status === 'released') expect(r.listed, `report ${r.id} in the table`).toBe(r.stored);
    }
  });

  it('does the same for every subsystem score, in its table and in the comparison table', async () => {
    const scores = await rows<{ reportId: number; subsystem: string; stored: number | null }>(
      'SELECT report_id AS reportId, subsystem, score AS stored FROM report_subsystem_scores',
    );
    const results = new Map(
      (await rows<{ id: number; result: unknown }>('SELECT id, result FROM reports')).map((r) => [
        r.id,
        (typeof r.result === 'string' ? JSON.parse(r.result) : r.result) as { subsystems: Array<{ id: string; score: number | null }> },
      ]),
    );
    expect(scores.length).toBeGreaterThan(80);
    for (const s of scores) {
      const raw = results.get(s.reportId)!.subsystems.find((x) => x.id === s.subsystem)!.score;
      expect(s.stored, `${s.subsystem} of report ${s.reportId}`).toBe(raw === null ? null : Math.floor(raw));
    }
    const [entry] = await rows<{ reportId: number; bed: number; electrical: number }>(
      'SELECT report_id AS reportId, bed_score AS bed, electrical_score AS electrical FROM comparison_entries ORDER BY report_id LIMIT 1',
    );
    const result = results.get(entry!.reportId)!;
    expect(entry!.bed).toBe(Math.floor(result.subsystems.find((x) => x.id === 'bed-and-ways')!.score!));
    expect(entry!.electrical).toBe(Math.floor(result.subsystems.find((x) => x.id === 'electrical-and-safety')!.score!));
  });

  it('puts the guard on released reports back as it was', async () => {
    const [released] = await rows<{ id: number }>("SELECT id FROM reports WHERE status = 'released' LIMIT 1");
    await expect(sql.query('UPDATE reports SET overall_score = overall_score + 1 WHERE id = ?', [released!.id])).rejects.toThrow(
      'A released report cannot be changed; issue a new version instead',
    );
  });
});
