import { afterEach, describe, expect, it } from '@jest/globals';
import { DataSource, EntitySchema, In, LessThan, MoreThanOrEqual } from 'typeorm';
import { bindNumberParameters } from './sqlite-bound-numbers.js';

interface Probe {
  id: number;
  count: number;
  ratio: number;
  label: string;
  flag: boolean;
  at: Date;
  data: { a: number } | null;
  version: number;
}

const ProbeSchema = new EntitySchema<Probe>({
  name: 'probe',
  columns: {
    id: { type: 'integer', primary: true, generated: true },
    count: { type: 'integer' },
    ratio: { type: 'real' },
    label: { type: 'varchar' },
    flag: { type: 'boolean' },
    at: { type: 'datetime' },
    data: { type: 'simple-json', nullable: true },
    version: { type: 'integer' },
  },
});

const ROWS: Omit<Probe, 'id'>[] = Array.from({ length: 12 }, (_, i) => ({
  count: i * 3,
  ratio: i / 4,
  label: `part ${i}`,
  flag: i % 2 === 0,
  at: new Date(Date.UTC(2026, 0, 1 + i)),
  data: i % 3 === 0 ? { a: i } : null,
  version: 1,
}));

const open: DataSource[] = [];

async function probeDatabase(bound: boolean): Promise<DataSource> {
  const dataSource = new DataSource({ type: 'better-sqlite3', database: ':memory:', entities: [ProbeSchema], synchronize: true });
  if (bound) bindNumberParameters(dataSource);
  await dataSource.initialize();
  open.push(dataSource);
  await dataSource.getRepository(ProbeSchema).save(ROWS.map((row) => ({ ...row })));
  return dataSource;
}

afterEach(async () => {
  for (const dataSource of open.splice(0)) await dataSource.destroy();
});

/** The same reads and writes on either database; what each returned. */
async function exercise(dataSource: DataSource): Promise<unknown[]> {
  const repo = dataSource.getRepository(ProbeSchema);
  const answers: unknown[] = [];
  answers.push(await repo.findOneBy({ id: 5 }));
  answers.push(await repo.findBy({ count: MoreThanOrEqual(9), ratio: LessThan(2.3), flag: true }));
  answers.push(await repo.findBy({ id: In([2, 4, 99]) }));
  answers.push(await repo.find({ where: { flag: false }, order: { count: 'DESC' }, skip: 1, take: 2 }));
  answers.push(
    await repo
      .createQueryBuilder('p')
      .where('p.ratio BETWEEN :low AND :high AND p.at < :before', { low: 0.5, high: 1.75, before: new Date(Date.UTC(2026, 0, 5)) })
      .orderBy('p.id')
      .getMany(),
  );
  answers.push(await repo.createQueryBuilder('p').select('SUM(p.count)', 'total').where('p.count > :min', { min: -1 }).getRawOne());
  const updated = await repo
    .createQueryBuilder()
    .update()
    .set({ label: 'changed', ratio: 7.5, version: () => '"version" + 1' })
    .where('id = :id AND version = :version', { id: 3, version: 1 })
    .execute();
  answers.push(updated.affected);
  const stale = await repo
    .createQueryBuilder()
    .update()
    .set({ label: 'lost' })
    .where('id = :id AND version = :version', { id: 3, version: 1 })
    .execute();
  answers.push(stale.affected);
  answers.push(await repo.findOneBy({ id: 3 }));
  // how SQLite stores what was written: an integer stays an integer, a real a real
  answers.push(
    await dataSource.query('SELECT typeof("count") AS c, typeof("ratio") AS r, typeof("version") AS v FROM "probe" WHERE "id" = 3'),
  );
  await repo.delete({ id: 12 });
  answers.push(await repo.count());
  return answers;
}

describe('bindNumberParameters (SQLite)', () => {
  it('without it TypeORM writes numbers into the SQL, so each value is a new statement', async () => {
    const dataSource = await probeDatabase(false);
    const sql = (id: number) =>
      dataSource.getRepository(ProbeSchema).createQueryBuilder('p').where('p.id = :id', { id }).getQueryAndParameters();
    expect(sql(7)[0]).toMatch(/"p"\."id" = 7/);
    expect(sql(7)[0]).not.toBe(sql(8)[0]);
  });

  it('binds numbers as parameters: one statement text for every value', async () => {
    const dataSource = await probeDatabase(true);
    const repo = dataSource.getRepository(ProbeSchema);
    const [seven, sevenParameters] = repo.createQueryBuilder('p').where('p.id = :id', { id: 7 }).getQueryAndParameters();
    const [eight] = repo.createQueryBuilder('p').where('p.id = :id', { id: 8 }).getQueryAndParameters();
    expect(seven).toMatch(/"p"\."id" = \?/);
    expect(sevenParameters).toEqual([7]);
    expect(seven).toBe(eight);
  });

  it('keeps the order of mixed parameters and binds booleans and lists as before', async () => {
    const dataSource = await probeDatabase(true);
    const [sql, parameters] = dataSource
      .getRepository(ProbeSchema)
      .createQueryBuilder('p')
      .where('p.label = :label AND p.count >= :min AND p.id IN (:...ids) AND p.flag = :flag AND p.ratio < :ratio', {
        label: 'part 1',
        min: 3,
        ids: [1, 2],
        flag: true,
        ratio: 2.5,
      })
      .getQueryAndParameters();
    expect(sql).toContain('"p"."label" = ? AND "p"."count" >= ? AND "p"."id" IN (?, ?) AND "p"."flag" = ? AND "p"."ratio" < ?');
    expect(parameters).toEqual(['part 1', 3, 1, 2, 1, 2.5]);
  });

  it('answers every read and write exactly as the inlining driver does', async () => {
    const inlined = await exercise(await probeDatabase(false));
    const bound = await exercise(await probeDatabase(true));
    expect(bound).toEqual(inlined);
    // the comparison above is not vacuous
    expect(inlined[0]).toMatchObject({ id: 5, count: 12, ratio: 1 });
    expect(inlined[6]).toBe(1);
    expect(inlined[7]).toBe(0);
    expect(inlined[9]).toEqual([{ c: 'integer', r: 'real', v: 'integer' }]);
  });
});
