import { like, or, sql, type SQL } from 'drizzle-orm';
import { machines } from '@/db/schema';

/** A LIKE pattern that finds `text` anywhere, its own %, _ and \ taken literally (MariaDB's default escape is \). */
export function containsPattern(text: string) {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

/** Machines whose maker, model, or maker and model together contain `text`. */
export function makerOrModelContains(text: string): SQL {
  const pattern = containsPattern(text);
  return or(like(machines.maker, pattern), like(machines.model, pattern), like(sql`concat(${machines.maker}, ' ', ${machines.model})`, pattern))!;
}
