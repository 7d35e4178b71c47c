import { describe, expect, it } from 'vitest';
import { BuildOrder, Kit, KitComponent, Part } from '../../models';
import { createPart, testDb, unique } from '../helpers/db';
import { signedIn } from '../helpers/http';

const csv = (...lines: string[]) => lines.join('\n') + '\n';

describe('parts import', () => {
  it('previews every row with its own field messages and writes nothing', async () => {
    const { agent } = await signedIn('clerk');
    const tag = unique('IMP').toUpperCase();
    const res = await agent.post('/api/v1/parts/import').send({
      csv: csv(
        'part_number,description,counting_method',
        `${tag}-1,Hex nut M4,scale`,
        `${tag} 2,Bad number,scale`,
        `${tag}-3,,hand`,
        `${tag}-4,Wrong method,guess`,
        `${tag}-1,Repeated,scale`,
      ),
      commit: true,
    });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ valid: false, committed: false });
    expect(res.body.rows.map((r: { line: number; errors: object }) => [r.line, Object.keys(r.errors)])).toEqual([
      [2, []],
      [3, ['part_number']],
      [4, ['description']],
      [5, ['counting_method']],
      [6, ['part_number']],
    ]);
    expect(res.body.rows[4].errors.part_number).toBe('repeats line 2');
    testDb();
    expect(await Part.count({ where: { partNumber: `${tag}-1` } })).toBe(0);
  });

  it('commits a good file whole: new parts are created and known part numbers updated', async () => {
    const { agent } = await signedIn('planner');
    const known = await createPart();
    const tag = unique('IMP').toUpperCase();
    const body = {
      csv: csv('Part_Number,Description,Counting_Method', `${tag}-a,Dowel pin 3 × 12,`, `${known.partNumber.toLowerCase()},Renamed by import,hand`),
    };
    const preview = await agent.post('/api/v1/parts/import').send(body);
    expect(preview.body).toMatchObject({ valid: true, committed: false });
    expect(preview.body.rows.map((r: { action: string }) => r.action)).toEqual(['create', 'update']);
    testDb();
    expect(await Part.count({ where: { partNumber: `${tag}-A` } })).toBe(0);
    const commit = await agent.post('/api/v1/parts/import').send({ ...body, commit: true });
    expect(commit.body).toMatchObject({ valid: true, committed: true });
    expect(await Part.findOne({ where: { partNumber: `${tag}-A` } })).toMatchObject({ description: 'Dowel pin 3 × 12', countingMethod: 'scale' });
    expect(await Part.findByPk(known.id)).toMatchObject({ description: 'Renamed by import', countingMethod: 'hand' });
  });

  it('answers an unreadable file or a body without text with 400 on the field', async () => {
    const { agent } = await signedIn('planner');
    const missing = await agent.post('/api/v1/parts/import').send({ csv: csv('part,desc', 'a,b') });
    expect(missing.status).toBe(400);
    expect(missing.body.error.fields.csv).toMatch(/missing column/);
    const broken = await agent.post('/api/v1/parts/import').send({ csv: 'part_number,description\n"unclosed,x\n' });
    expect(broken.status).toBe(400);
    expect(broken.body.error.fields.csv).toBeTruthy();
    const noText = await agent.post('/api/v1/parts/import').send({ commit: 'yes' });
    expect(noText.status).toBe(400);
    expect(Object.keys(noText.body.error.fields).sort()).toEqual(['commit', 'csv']);
  });
});

describe('bill-of-material import', () => {
  const header = 'kit_code,revision,description,part_number,quantity,tolerance_below,tolerance_above';

  it('writes nothing when one row of the file is bad, and says which row and why', async () => {
    const { agent } = await signedIn('planner');
    const screw = await createPart();
    const nut = await createPart();
    const code = unique('KIT').toUpperCase();
    const res = await agent.post('/api/v1/kits/import').send({
      csv: csv(
        header,
        `${code},A,End-cap kit,${screw.partNumber},4,0,1`,
        `${code},A,,${nut.partNumber},four,,`,
        `${code},A,,NO-SUCH-PART,2,,`,
        `${code},A,,${screw.partNumber},1,,`,
      ),
      commit: true,
    });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ valid: false, committed: false });
    const errors = res.body.rows.map((r: { errors: Record<string, string> }) => r.errors);
    expect(errors[0]).toEqual({});
    expect(errors[1]).toEqual({ quantity: 'Quantity must be a whole number' });
    expect(errors[2]).toEqual({ part_number: 'no such part' });
    expect(errors[3]).toEqual({ part_number: 'already on line 2 of this kit' });
    testDb();
    expect(await Kit.count({ where: { code } })).toBe(0);
  });

  it('creates several kit revisions from one good file, and replaces a revision no order was released from', async () => {
    const { agent } = await signedIn('planner');
    const [a, b, c] = [await createPart(), await createPart(), await createPart()];
    const code = unique('KIT').toUpperCase();
    const first = await agent.post('/api/v1/kits/import').send({
      csv: csv(header, `${code},A,Gearbox kit,${a.partNumber},4,0,1`, `${code},A,,${b.partNumber},2,,`, `${code},B,Gearbox kit rev B,${c.partNumber},6,1,1`),
      commit: true,
    });
    expect(first.body).toMatchObject({ valid: true, committed: true });
    testDb();
    const revA = (await Kit.findOne({ where: { code, revision: 'A' } }))!;
    expect(revA.description).toBe('Gearbox kit');
    expect(await KitComponent.count({ where: { kitId: revA.id } })).toBe(2);
    const revB = (await Kit.findOne({ where: { code, revision: 'B' } }))!;
    expect(await KitComponent.findAll({ where: { kitId: revB.id } })).toEqual([
      expect.objectContaining({ partId: c.id, quantity: 6, toleranceBelow: 1, toleranceAbove: 1 }),
    ]);

    const replace = await agent.post('/api/v1/kits/import').send({ csv: csv(header, `${code},A,,${c.partNumber},3,,`), commit: true });
    expect(replace.body).toMatchObject({ valid: true, committed: true, rows: [expect.objectContaining({ action: 'replace' })] });
    expect(await KitComponent.findAll({ where: { kitId: revA.id } })).toEqual([expect.objectContaining({ partId: c.id, quantity: 3 })]);
    expect((await Kit.findByPk(revA.id))!.description).toBe('Gearbox kit');
  });

  it('refuses to replace a revision that orders were released from', async () => {
    const planner = await signedIn('planner');
    const part = await createPart();
    const code = unique('KIT').toUpperCase();
    await planner.agent.post('/api/v1/kits/import').send({ csv: csv(header, `${code},A,Spacer kit,${part.partNumber},2,,`), commit: true });
    testDb();
    const kit = (await Kit.findOne({ where: { code, revision: 'A' } }))!;
    await BuildOrder.create({
      number: unique('BO').slice(0, 20),
      kitId: kit.id,
      quantity: 1,
      dueDate: null,
      status: 'released',
      createdBy: planner.userId,
      releasedAt: new Date(),
      completedAt: null,
      cancelledAt: null,
      overrideReason: null,
    });
    const res = await planner.agent.post('/api/v1/kits/import').send({ csv: csv(header, `${code},A,,${part.partNumber},5,,`), commit: true });
    expect(res.body).toMatchObject({ valid: false, committed: false });
    expect(res.body.rows[0].errors.kit_code).toMatch(/orders were released/);
    expect(await KitComponent.findAll({ where: { kitId: kit.id } })).toEqual([expect.objectContaining({ quantity: 2 })]);
  });
});
