/** A LIKE pattern that finds `text` anywhere, its own %, _ and \ taken literally (MariaDB's default escape is \). */
export function containsPattern(text: string) {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}
