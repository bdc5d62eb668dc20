import { mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { screenshot, signIn, startE2e, type E2e } from './support/e2e-app';

let e2e: E2e;
let documentsDir = '';
let filesDir = '';
let contractId = '';
const previousDocumentsDir = process.env.DOCUMENTS_DIR;

beforeAll(async () => {
  // Uploads go to a directory of this run's own, never to .data/documents.
  documentsDir = mkdtempSync(path.join(tmpdir(), 'duskhaul-documents-'));
  filesDir = mkdtempSync(path.join(tmpdir(), 'duskhaul-uploads-'));
  process.env.DOCUMENTS_DIR = documentsDir;
  e2e = await startE2e();
  const [row] = await e2e.db.query(
    `SELECT c.id FROM contracts c JOIN users u ON u.grower_id = c.grower_id
      WHERE u.email = 'grower@demo.test' AND c.archived_at IS NULL
      ORDER BY c.created_at LIMIT 1`,
  );
  contractId = row.id;
});
afterAll(async () => {
  await e2e?.close();
  if (previousDocumentsDir === undefined) delete process.env.DOCUMENTS_DIR;
  else process.env.DOCUMENTS_DIR = previousDocumentsDir;
  rmSync(documentsDir, { recursive: true, force: true });
  rmSync(filesDir, { recursive: true, force: true });
});

describe('contract documents in the browser', () => {
  it('when the planner uploads a shared PDF then it is listed, downloads as an attachment and the grower sees it', async () => {
    const pdf = path.join(filesDir, 'Pollination agreement.pdf');
    writeFileSync(
      pdf,
      Buffer.concat([Buffer.from('%PDF-1.4\n'), Buffer.from('1 0 obj << >> endobj\n%%EOF\n')]),
    );
    const page = await e2e.newPage({ width: 1400, height: 1000 });
    await signIn(page, e2e.origin, 'planner@demo.test');
    await page.goto(`${e2e.origin}/contracts/${contractId}`);

    const form = page.getByRole('form', { name: 'Upload a document' });
    await form.getByLabel('File').setInputFiles(pdf);
    await form.getByRole('checkbox', { name: 'Share with the grower' }).check();
    await form.getByRole('button', { name: 'Upload' }).click();

    const table = page.getByRole('table', { name: 'Documents' });
    const link = table.getByRole('link', { name: 'Pollination agreement.pdf' });
    await link.waitFor();
    const row = link.locator('xpath=ancestor::tr');
    expect(await row.getByText('Shared', { exact: true }).count()).toBe(1);
    expect(readdirSync(documentsDir)).toHaveLength(1);
    const [stored] = await e2e.db.query(
      `SELECT shared_with_grower, attached_kind FROM documents WHERE attached_id = $1`,
      [contractId],
    );
    expect(stored).toEqual({ shared_with_grower: true, attached_kind: 'contract' });

    const href = await link.getAttribute('href');
    expect(href).toMatch(/^\/api\/documents\/[0-9a-f-]{36}\/download$/);
    const download = await page.request.get(`${e2e.origin}${href}`);
    expect(download.status()).toBe(200);
    expect(download.headers()['content-disposition']).toMatch(/^attachment;/);
    expect((await download.body()).subarray(0, 8).toString()).toBe('%PDF-1.4');
    await screenshot(page, 'contract-documents');
    await page.close();

    const grower = await e2e.newPage();
    await signIn(grower, e2e.origin, 'grower@demo.test');
    const seen = await grower.request.get(
      `${e2e.origin}/api/documents?attachedKind=contract&attachedId=${contractId}`,
    );
    expect(seen.status()).toBe(200);
    const body = (await seen.json()) as { items: { name: string }[] };
    expect(body.items.map((d) => d.name)).toEqual(['Pollination agreement.pdf']);
    await grower.close();
  });

  it('when the planner uploads an HTML page named .pdf then it is refused with our message', async () => {
    const fake = path.join(filesDir, 'invoice.pdf');
    writeFileSync(fake, '<!doctype html><html><body><script>alert(1)</script></body></html>');
    const page = await e2e.newPage({ width: 1400, height: 1000 });
    await signIn(page, e2e.origin, 'planner@demo.test');
    await page.goto(`${e2e.origin}/contracts/${contractId}`);

    const form = page.getByRole('form', { name: 'Upload a document' });
    await form.getByLabel('File').setInputFiles(fake);
    await form.getByRole('button', { name: 'Upload' }).click();

    const alert = form.getByRole('alert');
    await alert.waitFor();
    expect(await alert.innerText()).toContain(
      "This kind of file isn't accepted: PDF, PNG, JPEG, GeoJSON or KML",
    );
    expect(await page.getByRole('link', { name: 'invoice.pdf' }).count()).toBe(0);
    expect(readdirSync(documentsDir)).toHaveLength(1);
    await screenshot(page, 'contract-documents-refused');
    await page.close();
  });
});
