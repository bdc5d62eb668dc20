import { readdir } from 'node:fs/promises';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInClient, type Client } from '../../../support/test-app';
import { createCrew, createYard, testPassword } from '../../../support/factories';
import { startMailTestApp, type MailTestApp } from '../emails/support';
import { detectDocumentType } from '../../../../server/modules/documents/content-type';
import {
  attachmentDisposition,
  sanitiseDisplayName,
} from '../../../../server/modules/documents/display-name';

let t: MailTestApp;
let people: Awaited<ReturnType<typeof createCrew>>;
let c: Record<'planner' | 'crew' | 'growerA' | 'growerB', Client>;
let contractA: string;
let yard: string;

const pdf = Buffer.from('%PDF-1.7\n1 0 obj << /Type /Catalog >> endobj\ntrailer << >>\n%%EOF\n');
const png = Buffer.concat([
  Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
  Buffer.alloc(32),
]);
const generatedName = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}\.[a-z]+$/;

function upload(
  client: Client,
  file: Buffer,
  filename: string,
  fields: Record<string, string> = {},
) {
  const request = client.agent.post('/api/documents').set('X-CSRF-Token', client.csrf);
  const all = {
    kind: 'contract',
    attachedKind: 'contract',
    attachedId: contractA,
    sharedWithGrower: 'true',
    ...fields,
  };
  for (const [key, value] of Object.entries(all)) request.field(key, value);
  return request.attach('file', file, { filename, contentType: 'application/octet-stream' });
}

const storeFiles = async () => (await readdir(t.documentsDir)).sort();

beforeAll(async () => {
  t = await startMailTestApp();
  people = await createCrew(t.db);
  const [row] = await t.db.query(
    `INSERT INTO contracts (operation_id, grower_id, crop, season, status, colonies_ordered, min_frames,
       fee_per_colony_cents, delivery_start_on, delivery_end_on)
     VALUES ($1, $2, 'almond', 2027, 'draft', 100, 6, 19000, '2027-02-05', '2027-02-10') RETURNING id`,
    [people.operationId, people.growerA],
  );
  contractA = row.id;
  yard = await createYard(t.db, people.operationId);
  c = {
    planner: await signedInClient(t.app, people.planner.email, testPassword),
    crew: await signedInClient(t.app, people.crew.email, testPassword),
    growerA: await signedInClient(t.app, people.growerUserA.email, testPassword),
    growerB: await signedInClient(t.app, people.growerUserB.email, testPassword),
  };
}, 60_000);
afterAll(() => t?.close());

describe('POST /api/documents', () => {
  it('when a planner uploads a PDF shared with grower A then grower A can download it as an attachment, and no one else of the wrong kind sees it', async () => {
    const up = await upload(c.planner, pdf, 'Pollination agreement 2027 – Ранчо.pdf');
    expect(up.status, JSON.stringify(up.body)).toBe(201);
    expect(up.body).toMatchObject({
      contentType: 'application/pdf',
      sizeBytes: pdf.length,
      name: 'Pollination agreement 2027 – Ранчо.pdf',
      sharedWithGrower: true,
    });

    const listA = await c.growerA.get(
      `/api/documents?attachedKind=contract&attachedId=${contractA}`,
    );
    expect(listA.body.items.map((d: { id: string }) => d.id)).toEqual([up.body.id]);
    const download = await c.growerA.get(`/api/documents/${up.body.id}/download`).buffer(true);
    expect(download.status).toBe(200);
    expect(download.headers['content-type']).toBe('application/pdf');
    expect(download.headers['x-content-type-options']).toBe('nosniff');
    expect(download.headers['content-disposition']).toBe(
      attachmentDisposition('Pollination agreement 2027 – Ранчо.pdf'),
    );
    expect(download.headers['content-disposition']).toMatch(
      /^attachment; filename="[ -~]+"; filename\*=UTF-8''/,
    );
    expect(Buffer.from(download.body).equals(pdf)).toBe(true);

    // Grower B, and crew (contract documents are not theirs), see nothing of it.
    expect((await c.growerB.get('/api/documents')).body.items).toEqual([]);
    expect((await c.growerB.get(`/api/documents/${up.body.id}`)).status).toBe(404);
    expect((await c.growerB.get(`/api/documents/${up.body.id}/download`)).status).toBe(404);
    expect((await c.crew.get(`/api/documents/${up.body.id}/download`)).status).toBe(404);
    expect((await c.growerB.get(`/api/contracts/${contractA}`)).status).toBe(404);

    // Unshared: grower A no longer sees it; a stale version gets 409.
    const unshare = await c.planner.post(`/api/documents/${up.body.id}/share`, {
      version: up.body.version,
      sharedWithGrower: false,
    });
    expect(unshare.status).toBe(200);
    expect((await c.growerA.get(`/api/documents/${up.body.id}`)).status).toBe(404);
    const stale = await c.planner.post(`/api/documents/${up.body.id}/share`, {
      version: up.body.version,
      sharedWithGrower: true,
    });
    expect(stale.status).toBe(409);
  });

  it('when crew open a yard photo then they may; uploads are for owners and planners only', async () => {
    const up = await upload(c.planner, png, 'yard.png', {
      kind: 'photo',
      attachedKind: 'yard',
      attachedId: yard,
      sharedWithGrower: 'false',
    });
    expect(up.status).toBe(201);
    expect(up.body.contentType).toBe('image/png');
    expect((await c.crew.get(`/api/documents/${up.body.id}/download`)).status).toBe(200);
    expect((await c.growerA.get(`/api/documents/${up.body.id}`)).status).toBe(404);
    expect((await upload(c.crew, png, 'crew.png')).status).toBe(403);
    expect((await upload(c.growerA, png, 'grower.png')).status).toBe(403);
  });

  it('when the file is one byte over the limit then 413 and nothing is stored', async () => {
    const before = await storeFiles();
    const limit = t.env.DOCUMENTS_MAX_BYTES;
    const tooBig = Buffer.alloc(limit + 1, 0x20);
    pdf.copy(tooBig);
    const response = await upload(c.planner, tooBig, 'big.pdf');
    expect(response.status).toBe(413);
    expect(response.body.error.code).toBe('payload_too_large');
    expect(await storeFiles()).toEqual(before);

    const exactly = Buffer.alloc(limit, 0x20);
    pdf.copy(exactly);
    expect((await upload(c.planner, exactly, 'exact.pdf')).status).toBe(201);
  });

  it('when the content is not an allowed type then 415 whatever the name says', async () => {
    const before = await storeFiles();
    const html = Buffer.from('<!doctype html><script>alert(1)</script>');
    const exe = Buffer.concat([Buffer.from('MZ'), Buffer.alloc(200, 0x90)]);
    const svg = Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"><script>1</script></svg>');
    const kmlWithDoctype = Buffer.from(
      '<?xml version="1.0"?><!DOCTYPE kml [<!ENTITY x "y">]><kml/>',
    );
    for (const [body, name] of [
      [html, 'invoice.pdf'],
      [exe, 'photo.jpg'],
      [svg, 'map.png'],
      [kmlWithDoctype, 'block.kml'],
    ] as const) {
      const response = await upload(c.planner, body, name);
      expect(response.status, name).toBe(415);
      expect(response.body.error.code).toBe('unsupported_media_type');
    }
    const json = await c.planner.post('/api/documents', { kind: 'other' });
    expect(json.status).toBe(415);
    expect(await storeFiles()).toEqual(before);
  });

  it('when file names are hostile then only one generated-name file appears, in the store, per upload', async () => {
    const parent = path.dirname(t.documentsDir);
    const parentBefore = (await readdir(parent)).sort();
    const hostile = [
      '../../../etc/passwd.pdf',
      '..\\..\\windows\\system.ini.pdf',
      'invoice\u202Efdp.exe.pdf',
      `${'a'.repeat(300)}.pdf`,
      '.hidden.pdf',
    ];
    for (const name of hostile) {
      const before = await storeFiles();
      const response = await upload(c.planner, pdf, name);
      expect(response.status, name).toBe(201);
      const after = await storeFiles();
      const added = after.filter((f) => !before.includes(f));
      expect(added).toHaveLength(1);
      expect(added[0]).toMatch(generatedName);
      expect(after.length).toBe(before.length + 1);
      const shown: string = response.body.name;
      expect(shown).not.toMatch(/[/\\\u202e]/);
      expect(shown.includes(String.fromCharCode(0))).toBe(false);
      expect(shown.startsWith('.')).toBe(false);
      expect([...shown].length).toBeLessThanOrEqual(120);
      expect(shown.endsWith('.pdf')).toBe(true);
    }
    expect((await readdir(parent)).sort()).toEqual(parentBefore);
  });

  it('when a name carries NUL then a raw one is refused (400) and an RFC 5987 one is cleaned; nothing else changes', async () => {
    const before = await storeFiles();
    const raw = await upload(c.planner, pdf, `nul${String.fromCharCode(0)}byte.pdf`);
    expect([201, 400]).toContain(raw.status);
    if (raw.status === 400) expect(await storeFiles()).toEqual(before);

    const boundary = 'matrix-boundary-7d1f';
    const part = (headers: string, body: Buffer | string) =>
      Buffer.concat([
        Buffer.from(`--${boundary}\r\n${headers}\r\n\r\n`),
        Buffer.from(body),
        Buffer.from('\r\n'),
      ]);
    const body = Buffer.concat([
      part('Content-Disposition: form-data; name="kind"', 'contract'),
      part('Content-Disposition: form-data; name="attachedKind"', 'contract'),
      part('Content-Disposition: form-data; name="attachedId"', contractA),
      part(
        `Content-Disposition: form-data; name="file"; filename*=UTF-8''..%2F..%2Fnul%00byte%E2%80%AEfdp.exe.pdf\r\nContent-Type: application/pdf`,
        pdf,
      ),
      Buffer.from(`--${boundary}--\r\n`),
    ]);
    const encoded = await c.planner.agent
      .post('/api/documents')
      .set('X-CSRF-Token', c.planner.csrf)
      .set('Content-Type', `multipart/form-data; boundary=${boundary}`)
      .send(body);
    expect(encoded.status, JSON.stringify(encoded.body)).toBe(201);
    // busboy keeps only the last path segment; we drop the NUL and the right-to-left override.
    expect(encoded.body.name).toBe('nulbytefdp.exe.pdf');
    const added = (await storeFiles()).filter((f) => !before.includes(f));
    expect(added.length).toBe(raw.status === 201 ? 2 : 1);
    for (const f of added) expect(f).toMatch(generatedName);
  });

  it('when the target belongs to nobody here then 400 naming attachedId', async () => {
    const response = await upload(c.planner, pdf, 'x.pdf', {
      attachedId: '00000000-0000-4000-8000-000000000000',
    });
    expect(response.status).toBe(400);
    expect(response.body.error.details[0].field).toBe('attachedId');
  });
});

describe('detectDocumentType and sanitiseDisplayName', () => {
  it('when given bytes then the type comes from content only', () => {
    expect(detectDocumentType(pdf)?.contentType).toBe('application/pdf');
    expect(detectDocumentType(Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0, 0x10]))?.contentType).toBe(
      'image/jpeg',
    );
    expect(
      detectDocumentType(Buffer.from('{"type":"FeatureCollection","features":[]}'))?.contentType,
    ).toBe('application/geo+json');
    expect(detectDocumentType(Buffer.from('{"a":1}'))?.contentType).toBe('application/json');
    expect(
      detectDocumentType(
        Buffer.from(
          '<?xml version="1.0" encoding="UTF-8"?>\n<kml xmlns="http://www.opengis.net/kml/2.2"></kml>',
        ),
      )?.contentType,
    ).toBe('application/vnd.google-earth.kml+xml');
    expect(detectDocumentType(Buffer.from('{"a":'))).toBeNull();
    expect(detectDocumentType(Buffer.from([0xc3, 0x28]))).toBeNull();
    expect(detectDocumentType(Buffer.alloc(0))).toBeNull();
  });

  it('when a name is hostile then the display name is a harmless label', () => {
    expect(sanitiseDisplayName('../../etc/passwd', '.pdf')).toBe('_.._etc_passwd');
    expect(sanitiseDisplayName('a\u0000b\u202Ec.pdf', '.pdf')).toBe('abc.pdf');
    expect(sanitiseDisplayName('\u0000', '.pdf')).toBe('document.pdf');
    expect([...sanitiseDisplayName(`${'é'.repeat(300)}.pdf`, '.pdf')]).toHaveLength(120);
  });
});
