import { describe, expect, it } from 'vitest';
import { remindersOwed } from './reminder-rules.js';

const HOUR = 3_600_000;
const lifted = new Date('2026-08-15T18:30:00Z');
const base = { liftedAt: lifted, bandsOffAt: null, toReprocess: 0, reprocessed: false, claimed: [] };

describe('remindersOwed', () => {
  it('owes the bands reminder at 12 h, stale at 24 h (USDA Complete Guide, Guide 1: cool 12 to 24 hours)', () => {
    expect(remindersOwed(base)).toEqual([
      {
        kind: 'bands-ready',
        dueAt: new Date(lifted.getTime() + 12 * HOUR),
        staleAt: new Date(lifted.getTime() + 24 * HOUR),
      },
    ]);
  });

  it('owes nothing about bands once they are off, or once claimed', () => {
    expect(remindersOwed({ ...base, bandsOffAt: new Date(lifted.getTime() + 13 * HOUR) })).toEqual([]);
    expect(remindersOwed({ ...base, claimed: ['bands-ready'] })).toEqual([]);
  });

  it('owes the reprocess reminder 2 h before the 24 h window closes (USDA Guide 1: reprocess within 24 hours)', () => {
    const owed = remindersOwed({ ...base, bandsOffAt: lifted, toReprocess: 2 });
    expect(owed).toEqual([
      {
        kind: 'reprocess-deadline',
        dueAt: new Date(lifted.getTime() + 22 * HOUR),
        staleAt: new Date(lifted.getTime() + 24 * HOUR),
      },
    ]);
  });

  it('owes no reprocess reminder when no jar is marked for it, a load carries them, or it was claimed', () => {
    expect(remindersOwed({ ...base, claimed: ['bands-ready'], toReprocess: 0 })).toEqual([]);
    expect(remindersOwed({ ...base, claimed: ['bands-ready'], toReprocess: 1, reprocessed: true })).toEqual([]);
    expect(remindersOwed({ ...base, claimed: ['bands-ready', 'reprocess-deadline'], toReprocess: 1 })).toEqual([]);
  });

  it('owes both for a load with bands on and jars to reprocess', () => {
    expect(remindersOwed({ ...base, toReprocess: 1 }).map((r) => r.kind)).toEqual([
      'bands-ready',
      'reprocess-deadline',
    ]);
  });
});
