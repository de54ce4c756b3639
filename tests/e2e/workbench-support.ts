// Helpers for the workbench tests: extract the text of a PDF with pdfjs-dist (no rendering).
import { createRequire } from 'node:module';
import path from 'node:path';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';

// The standard-font metrics ship inside the package: read them from disk, never fetched.
const FONTS = `${path.join(path.dirname(createRequire(import.meta.url).resolve('pdfjs-dist/package.json')), 'standard_fonts')}/`;

export async function pdfText(bytes: Uint8Array): Promise<string> {
  const doc = await getDocument({ data: new Uint8Array(bytes), useSystemFonts: false, isEvalSupported: false, standardFontDataUrl: FONTS }).promise;
  const pages: string[] = [];
  for (let i = 1; i <= doc.numPages; i += 1) {
    const page = await doc.getPage(i);
    const content = await page.getTextContent();
    pages.push(content.items.map((it) => ('str' in it ? it.str : '')).join(' '));
  }
  await doc.destroy();
  return pages.join('\n').replace(/\s+/g, ' ');
}

/**
 * A fresh account on the demo site (Calder Reach Works), so the workbench tests do not spend the
 * shared demo accounts' sign-in rate limit. Returns its e-mail; the password is the demo password.
 */
export async function demoSiteUser(role: 'technician' | 'supervisor', displayName: string): Promise<string> {
  const [{ hash }, { v7 }, { query }, { DEMO_PASSWORD }] = await Promise.all([import('@node-rs/argon2'), import('uuid'), import('../support/db'), import('../support/http')]);
  const [demo] = await query<{ id: string }>("SELECT id FROM sites WHERE code = 'calder-reach'");
  if (!demo) throw new Error('the demo site is not seeded');
  const id = v7();
  const email = `workbench-${role}-${id.slice(-12)}@calder-reach.test`;
  await query("INSERT INTO users (id, site_id, email, display_name, role, status, password_hash, created_at) VALUES (?, ?, ?, ?, ?, 'active', ?, UTC_TIMESTAMP(3))", [id, demo.id, email, displayName, role, await hash(DEMO_PASSWORD)]);
  return email;
}
