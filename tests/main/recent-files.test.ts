import { describe, expect, it } from 'vitest';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createRecentStore, MAX_RECENT, recentLabel } from '../../app/main/recent-files';

const store = () => createRecentStore(join(mkdtempSync(join(tmpdir(), 'ts-recent-')), 'r.json'));

describe('createRecentStore()', () => {
  it('createRecentStore() lists the newest entry first, without paths', async () => {
    const s = store();
    await s.remember('data', ['/lab/a_40C.csv', '/lab/a_60C.csv']);
    await s.remember('analysis', ['/lab/b.thermoshift.json']);
    const list = await s.list();
    expect(list.map((e) => e.label)).toEqual(['b.thermoshift.json', 'a_40C.csv + 1 more']);
    expect(JSON.stringify(list)).not.toContain('/lab/');
    expect(await s.paths(list[1].id)).toEqual({
      kind: 'data',
      paths: ['/lab/a_40C.csv', '/lab/a_60C.csv'],
    });
  });

  it('createRecentStore() moves a re-opened file to the top and keeps at most MAX_RECENT', async () => {
    const s = store();
    for (let i = 0; i < MAX_RECENT + 3; i++) await s.remember('data', [`/d/${i}.csv`]);
    await s.remember('data', ['/d/5.csv']);
    const list = await s.list();
    expect(list).toHaveLength(MAX_RECENT);
    expect(list[0].label).toBe('5.csv');
    expect(list.filter((e) => e.label === '5.csv')).toHaveLength(1);
  });

  it('createRecentStore() rejects an unknown id with a readable message', async () => {
    await expect(store().paths('nope')).rejects.toThrow(/no longer in the list/);
  });
});

describe('recentLabel()', () => {
  it('recentLabel() names the first file and counts the rest', () => {
    expect(recentLabel(['/x/one.csv'])).toBe('one.csv');
    expect(recentLabel(['/x/one.csv', '/x/two.csv', '/x/three.csv'])).toBe('one.csv + 2 more');
  });
});
