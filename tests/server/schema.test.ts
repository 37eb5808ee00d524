// The synced tables agree with the zod contract (shared/schemas/records.ts) and with contracts.md's conventions;
// the change_seq trigger stamps every write in commit order.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { COLLECTIONS, type CollectionName } from '../../shared/schemas';
import { SYNCED_FIELD_COLUMNS, snakeCase, tableOf } from '../../server/src/db/synced-columns';
import { startTestApp, type TestApp } from './helpers/test-app';

const NAMES = Object.keys(COLLECTIONS) as CollectionName[];

describe('synced tables', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.close());

  it.each(NAMES)('%s: the column list covers exactly the zod fields', (c) => {
    const shape = (COLLECTIONS[c].fields as unknown as { shape: Record<string, unknown> }).shape;
    expect(Object.keys(SYNCED_FIELD_COLUMNS[c]).sort()).toEqual(Object.keys(shape).sort());
  });

  it.each(NAMES)('%s: the live table has every field column plus the sync columns, with the right nullability', async (c) => {
    const rows: { column_name: string; is_nullable: string; data_type: string }[] = await t.deps.dataSource.query(
      `SELECT column_name, is_nullable, data_type FROM information_schema.columns WHERE table_schema = 'public' AND table_name = $1`,
      [tableOf(c)],
    );
    const live = new Map(rows.map((r) => [r.column_name, r]));
    for (const [prop, col] of Object.entries(SYNCED_FIELD_COLUMNS[c])) {
      const l = live.get(snakeCase(prop));
      expect(l, `${tableOf(c)}.${snakeCase(prop)}`).toBeDefined();
      expect(l!.is_nullable === 'YES', `${tableOf(c)}.${snakeCase(prop)} nullable`).toBe(col.nullable ?? false);
      const expectedType = col.type === 'timestamptz' ? 'timestamp with time zone' : col.type;
      expect(l!.data_type).toBe(expectedType);
    }
    for (const meta of ['id', 'club_id', 'created_at', 'updated_at', 'deleted_at', 'field_clocks', 'deleted_clock', 'change_seq']) {
      expect(live.has(meta), `${tableOf(c)}.${meta}`).toBe(true);
    }
    expect(live.size).toBe(Object.keys(SYNCED_FIELD_COLUMNS[c]).length + 8);
  });

  it('every insert and update takes a new, increasing change_seq from the trigger (not from the app)', async () => {
    const ds = t.deps.dataSource;
    const [club] = await ds.query(`INSERT INTO clubs (name) VALUES ('Seq test club') RETURNING id`);
    const repo = ds.getRepository('coax');
    await repo.insert({ id: '00000000-0000-4000-8000-000000000001', clubId: club.id, label: 'A', type: 'RG-8X', lengthM: 15, notes: '' });
    await repo.insert({ id: '00000000-0000-4000-8000-000000000002', clubId: club.id, label: 'B', type: 'RG-213', lengthM: 30, notes: '' });
    const before = await repo.find({ order: { changeSeq: 'ASC' } });
    expect(before.map((r) => r.label)).toEqual(['A', 'B']);
    await repo.update({ id: '00000000-0000-4000-8000-000000000001' }, { lengthM: 16 });
    const after = await repo.findOneByOrFail({ id: '00000000-0000-4000-8000-000000000001' });
    expect(typeof after.changeSeq).toBe('number');
    expect(after.changeSeq).toBeGreaterThan(before[1].changeSeq);
    expect(after.fieldClocks).toEqual({});
  });

  it('a second writer waits for the first to commit, so change_seq order is commit order (the advisory lock)', async () => {
    const ds = t.deps.dataSource;
    const [club] = await ds.query(`INSERT INTO clubs (name) VALUES ('Lock club') RETURNING id`);
    const first = ds.createQueryRunner();
    const second = ds.createQueryRunner();
    await first.connect();
    await second.connect();
    try {
      await first.startTransaction();
      await second.startTransaction();
      await first.query(`INSERT INTO coax (id, club_id, label, type, length_m, notes) VALUES (gen_random_uuid(), $1, 'first', 'RG-58', 5, '')`, [club.id]);
      let secondDone = false;
      const secondWrite = second
        .query(`INSERT INTO coax (id, club_id, label, type, length_m, notes) VALUES (gen_random_uuid(), $1, 'second', 'RG-58', 5, '')`, [club.id])
        .then(() => (secondDone = true));
      await new Promise((ok) => setTimeout(ok, 300));
      expect(secondDone).toBe(false); // blocked on the lock the first writer holds until it commits
      await first.commitTransaction();
      await secondWrite;
      await second.commitTransaction();
    } finally {
      await first.release();
      await second.release();
    }
    const rows: { label: string; change_seq: number }[] = await ds.query(`SELECT label, change_seq FROM coax WHERE club_id = $1 ORDER BY change_seq`, [club.id]);
    expect(rows.map((r) => r.label)).toEqual(['first', 'second']);
  });

  it('reads instants inside fields as ISO strings and dates as YYYY-MM-DD, as the zod schemas describe them', async () => {
    const ds = t.deps.dataSource;
    const [club] = await ds.query(`INSERT INTO clubs (name) VALUES ('Types club') RETURNING id`);
    const siteId = '00000000-0000-4000-8000-0000000000a1';
    await ds.getRepository('events').insert({ id: '00000000-0000-4000-8000-0000000000e1', clubId: club.id, siteId, name: 'E', startsOn: '2026-12-01', endsOn: '2026-12-02', notes: '' });
    const e = await ds.getRepository('events').findOneByOrFail({ id: '00000000-0000-4000-8000-0000000000e1' });
    expect(e.startsOn).toBe('2026-12-01');
    await ds.getRepository('measurements').insert({
      id: '00000000-0000-4000-8000-0000000000b1', clubId: club.id, siteId, subjectCollection: 'supports',
      subjectId: siteId, kind: 'height', method: 'tangent', inputs: { distanceM: 20 }, valueM: 12.5, takenAt: '2026-11-30T10:00:00.000Z', takenBy: null,
    });
    const m = await ds.getRepository('measurements').findOneByOrFail({ id: '00000000-0000-4000-8000-0000000000b1' });
    expect(m.takenAt).toBe('2026-11-30T10:00:00.000Z');
    expect(m.inputs).toEqual({ distanceM: 20 });
  });
});
