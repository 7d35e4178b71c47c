import { readdirSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { Part } from '../../models';
import { createPart, createTestWeight, testDb } from '../helpers/db';
import { anonymous, signedIn } from '../helpers/http';

const PNG = Buffer.from('89504e470d0a1a0a0000000d4948445200000001000000010806000000', 'hex');
const storedFiles = () => new Set(readdirSync(process.env.UPLOAD_DIR!).filter((f) => !f.startsWith('.')));

describe('uploads', () => {
  it('stores a part photo checked by its content and serves it to signed-in users only', async () => {
    const { agent } = await signedIn('planner');
    const part = await createPart();
    const res = await agent.put(`/api/v1/parts/${part.id}/photo`).attach('photo', PNG, { filename: 'screw.png', contentType: 'image/png' });
    expect(res.status).toBe(200);
    expect(res.body.part.hasPhoto).toBe(true);
    const photo = await agent.get(`/api/v1/parts/${part.id}/photo`).buffer(true);
    expect(photo.headers['content-type']).toBe('image/png');
    expect(Buffer.from(photo.body).subarray(0, 8)).toEqual(PNG.subarray(0, 8));
    expect((await anonymous().get(`/api/v1/parts/${part.id}/photo`)).status).toBe(401);
  });

  it('refuses a file that only claims to be an image, and an oversized one, writing nothing', async () => {
    const { agent } = await signedIn('clerk');
    const part = await createPart();
    const fake = await agent
      .put(`/api/v1/parts/${part.id}/photo`)
      .attach('photo', Buffer.from('<html><script>alert(1)</script>'), { filename: 'photo.jpg', contentType: 'image/jpeg' });
    expect(fake.status).toBe(400);
    expect(fake.body.error.fields.photo).toMatch(/JPEG, PNG, WEBP/);
    const big = await agent.put(`/api/v1/parts/${part.id}/photo`).attach('photo', Buffer.concat([PNG, Buffer.alloc(5 * 1024 * 1024)]), { filename: 'big.png' });
    expect(big.status).toBe(400);
    expect(big.body.error.fields.photo).toMatch(/at most 5 MB/);
    expect((await agent.get(`/api/v1/parts/${part.id}/photo`)).status).toBe(404);
  });

  it('removes the photo a new one replaces, and leaves no file behind when the part is not there', async () => {
    const { agent } = await signedIn('planner');
    const part = await createPart();
    expect((await agent.put(`/api/v1/parts/${part.id}/photo`).attach('photo', PNG, { filename: 'first.png' })).status).toBe(200);
    testDb();
    const first = (await Part.findByPk(part.id))!.photoFile!;
    expect(storedFiles().has(first)).toBe(true);
    expect((await agent.put(`/api/v1/parts/${part.id}/photo`).attach('photo', PNG, { filename: 'second.png' })).status).toBe(200);
    const second = (await Part.findByPk(part.id))!.photoFile!;
    expect(second).not.toBe(first);
    expect(storedFiles().has(second)).toBe(true);
    expect(storedFiles().has(first)).toBe(false);

    const before = storedFiles();
    const missing = await agent.put('/api/v1/parts/2147483647/photo').attach('photo', PNG, { filename: 'nobody.png' });
    expect(missing.status).toBe(404);
    expect(storedFiles()).toEqual(before);
  });

  it('keeps a test weight certificate as a PDF', async () => {
    const { agent } = await signedIn('quality');
    const weight = await createTestWeight(500, 'F1');
    const pdf = Buffer.from('%PDF-1.4\n%test certificate\n');
    const res = await agent.put(`/api/v1/test-weights/${weight.id}/certificate`).attach('certificate', pdf, { filename: 'cert.pdf' });
    expect(res.status).toBe(200);
    expect(res.body.testWeight.hasCertificate).toBe(true);
    const back = await agent.get(`/api/v1/test-weights/${weight.id}/certificate`).buffer(true);
    expect(back.headers['content-type']).toBe('application/pdf');
    const notPdf = await agent.put(`/api/v1/test-weights/${weight.id}/certificate`).attach('certificate', PNG, { filename: 'cert.pdf' });
    expect(notPdf.status).toBe(400);
  });
});
