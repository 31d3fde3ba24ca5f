import { eq } from 'drizzle-orm';
import { afterAll, describe, expect, it } from 'vitest';
import { closeDatabase, db } from '@/db/client';
import { machines } from '@/db/schema';
import { createMachine } from '@/lib/workflow/machines';
import { createAccount } from '../support/accounts';
import { sessionCookie } from '../support/private-stack';

const APP_URL = process.env.APP_URL ?? 'http://localhost:3100';

/** Strings that break a page or a query when they are treated as markup or SQL rather than text. */
const HOSTILE = {
  maker: `<script>alert('maker')</script>`,
  model: `"><img src=x onerror=alert(1)>`,
  serialNumber: `'; DROP TABLE machines; --`,
  town: `Bren' OR '1'='1`,
  region: `{{7*7}} \${7*7} <%= 7*7 %>`,
  accessories: `<svg onload=alert(document.cookie)></svg> & "quotes" 'apostrophes' \\ back\\slash`,
  description: `Line one\n<iframe src="javascript:alert(1)"></iframe>\n\u202Eright-to-left 🛠️ Ω≈ç√ — 1 < 2 > 0`,
};

/** How React writes text into HTML: the five characters that could open markup are escaped. */
function asHtmlText(text: string) {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&#x27;');
}

describe('a listing with markup and SQL in every text field', () => {
  afterAll(() => closeDatabase());

  it('stores every string exactly and shows it back on the listing page as plain text', async () => {
    const seller = await createAccount('seller');
    const result = await createMachine.execute(seller.actor, {
      ...HOSTILE,
      latheKind: 'general_purpose',
      swingMm: '330',
      betweenCentresMm: '1000',
      listingStatus: 'draft',
    });
    if (!result.ok) throw new Error(`${result.message} ${JSON.stringify(result.fieldErrors)}`);
    const [row] = await db.select().from(machines).where(eq(machines.id, result.data.machineId));
    expect(row).toMatchObject({ ...HOSTILE, description: HOSTILE.description.trim() });
    // The machines table is still there and still holds the other rows.
    expect((await db.select({ id: machines.id }).from(machines).limit(2)).length).toBeGreaterThan(0);

    const response = await fetch(`${APP_URL}/machines/${result.data.machineId}`, { headers: { cookie: await sessionCookie({ ...seller, sessionVersion: 0 }) }, redirect: 'manual' });
    expect(response.status).toBe(200);
    const html = await response.text();
    for (const value of [HOSTILE.maker, HOSTILE.model, HOSTILE.serialNumber]) {
      expect(html).toContain(asHtmlText(value));
    }
    // None of it arrives as markup the browser would run.
    expect(html).not.toContain(`<script>alert('maker')`);
    expect(html).not.toContain('<img src=x onerror');
    expect(html).not.toMatch(/<svg onload=alert/);
    expect(html).not.toMatch(/<iframe src="javascript:/);
  });
});
