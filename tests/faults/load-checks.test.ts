// The arithmetic and the invariants of the load test (tools/load), checked without a server.
import { describe, expect, it } from 'vitest';
import { checkOwnDesigns, checkSharedDesign } from '../../tools/load/invariants.mjs';
import { rampStart } from '../../tools/load/scenario.mjs';
import { judgeLatency, Recorder, percentile, slowestKind, TARGETS } from '../../tools/load/stats.mjs';

describe('percentile (nearest rank)', () => {
  // Worked examples of the nearest-rank method in the Wikipedia article "Percentile" (from memory).
  it('matches the worked examples', () => {
    const five = [15, 20, 35, 40, 50];
    expect([5, 30, 40, 50, 100].map((p) => percentile(five, p))).toEqual([15, 20, 20, 35, 50]);
    const ten = [3, 6, 7, 8, 8, 10, 13, 15, 16, 20];
    expect([25, 50, 75, 100].map((p) => percentile(ten, p))).toEqual([7, 8, 15, 20]);
  });

  it('p99 of 1..1000 is 990 and p50 of one value is that value', () => {
    const values = Array.from({ length: 1000 }, (_, i) => i + 1);
    expect(percentile(values, 99)).toBe(990);
    expect(percentile([42], 50)).toBe(42);
  });
});

describe('Recorder', () => {
  it('counts statuses and rates per kind and overall', () => {
    const recorder = new Recorder();
    recorder.record('save', 10, 200);
    recorder.record('save', 30, 409);
    recorder.record('search', 20, 200);
    recorder.record('search', null, 'transport error');
    const rows = recorder.summary(2);
    expect(rows.map((r: { kind: string }) => r.kind)).toEqual(['save', 'search', 'all']);
    expect(rows[0]).toMatchObject({ count: 2, perSecond: 1, p50: 10, max: 30, statuses: { 200: 1, 409: 1 } });
    expect(rows[1]).toMatchObject({ count: 2, p50: 20, max: 20 }); // a transport error is counted, not timed
    expect(rows[2]).toMatchObject({ count: 4, perSecond: 2, max: 30, statuses: { 200: 2, 409: 1, 'transport error': 1 } });
  });

  it('summarises the part of the run after the ramp on its own', () => {
    const recorder = new Recorder();
    recorder.record('search', 3000, 200, { at: 100, newConnection: true }); // sent during the ramp
    recorder.record('search', 40, 200, { at: 900 });
    recorder.record('save', 60, 200, { at: 1000, newConnection: true });
    recorder.record('save', 20, 200, { at: 1500 });
    const whole = recorder.summary(2);
    const after = recorder.summary(1, { from: 1000 });
    expect(whole[whole.length - 1]).toMatchObject({ count: 4, max: 3000 });
    expect(after.map((r) => r.kind)).toEqual(['save', 'all']);
    expect(after[1]).toMatchObject({ count: 2, perSecond: 2, p50: 20, max: 60 });
    expect(recorder.newConnections()).toMatchObject({ count: 2, max: 3000, lastAt: 1000 });
  });
});

describe('load-test ramp and targets', () => {
  it('starts the clients evenly over the ramp, the last before its end', () => {
    expect([0, 1, 2, 3, 49].map((i) => rampStart(i, 50, 5000))).toEqual([0, 100, 200, 300, 4900]);
    expect(rampStart(0, 1, 0)).toBe(0);
  });

  it('judges p99 under 300 ms and the maximum under 1 s, both strictly', () => {
    expect(TARGETS).toEqual({ clients: 50, p99Ms: 300, maxMs: 1000 });
    const row = { kind: 'all', count: 1, perSecond: 1, p50: 1, p95: 1, statuses: {} };
    expect(judgeLatency({ ...row, p99: 299.9, max: 999.9 }).map((t) => t.met)).toEqual([true, true]);
    expect(judgeLatency({ ...row, p99: 300, max: 1000 }).map((t) => t.met)).toEqual([false, false]);
  });

  it('names the kind that holds the maximum and the largest maximum of the others', () => {
    const recorder = new Recorder();
    recorder.record('sign-in', 1400, 200);
    recorder.record('save', 300, 200);
    recorder.record('search', 500, 200);
    expect(slowestKind(recorder.summary(1))).toEqual({ kind: 'sign-in', max: 1400, othersMax: 500 });
  });
});

describe('load-test invariants', () => {
  const initial = { version: 1, name: 'Shared', tag: 0 };
  const race = [
    { baseVersion: 1, status: 200, version: 2, tag: 11 },
    { baseVersion: 1, status: 409, tag: 12 },
    { baseVersion: 2, status: 409, tag: 13 },
    { baseVersion: 2, status: 200, version: 3, tag: 14 },
  ];

  it('accepts one winner per version and the last winner stored', () => {
    expect(checkSharedDesign(race, initial, { version: 3, name: 'x', tag: 14 })).toEqual([]);
    expect(checkSharedDesign([], initial, { version: 1, name: 'Shared', tag: 0 })).toEqual([]);
  });

  it('reports two winners on one version, a lost save, a mixed or stale row', () => {
    const twoWinners = [...race, { baseVersion: 2, status: 200, version: 3, tag: 15 }];
    expect(checkSharedDesign(twoWinners, initial, { version: 3, name: 'x', tag: 14 }).join()).toMatch(/version 2 .*2 saves won/);
    expect(checkSharedDesign(race, initial, { version: 2, name: 'x', tag: 11 }).join()).toMatch(/stores version 2/);
    expect(checkSharedDesign(race, initial, { version: 3, name: 'x', tag: 13 }).join()).toMatch(/content of save 13/);
    expect(checkSharedDesign(race, initial, { version: 4, name: 'x', tag: 14 }).join()).toMatch(/version 4 without/);
    const noWinner = race.map((a) => (a.baseVersion === 2 ? { ...a, status: 409 } : a));
    expect(checkSharedDesign(noWinner, initial, { version: 2, name: 'x', tag: 11 }).join()).toMatch(/0 saves won/);
    expect(checkSharedDesign([{ baseVersion: 1, status: 500, tag: 1 }], initial, initial).join()).toMatch(/answered 500/);
  });

  it('compares every own design with its last acknowledged save', () => {
    const clients = [
      { client: 0, designId: 7, acknowledged: { version: 5, name: 'a', tag: 3 } },
      { client: 1, designId: 8, acknowledged: { version: 2, name: 'b', tag: 4 } },
    ];
    const rows = new Map([
      [7, { version: 5, name: 'a', tag: 3 }],
      [8, { version: 2, name: 'b', tag: 4 }],
    ]);
    expect(checkOwnDesigns(clients, (id: number) => rows.get(id))).toEqual([]);
    rows.set(8, { version: 2, name: 'b', tag: 9 });
    expect(checkOwnDesigns(clients, (id: number) => rows.get(id))).toEqual([
      'client 1: design 8 stores tag 9, the last acknowledged save gave 4',
    ]);
    expect(checkOwnDesigns(clients, () => undefined)).toHaveLength(2);
  });
});
