import { describe, expect, it } from 'vitest';
import { addBand, draftBandLabels, removeBand } from './process-table-draft';
import type { BoilingWaterDraft } from './recipe-draft';

// The NCHFP salsa layout: 0-1,000 / 1,001-6,000 / above 6,000 ft, pints 15/20/25 min.
const salsaTable = (): BoilingWaterDraft => ({
  bands: [
    { key: 'a', bound: '1000' },
    { key: 'b', bound: '6000' },
    { key: 'c', bound: '' },
  ],
  openTop: true,
  rows: [{ key: 'r', jarSize: 'pint', pack: 'hot', minutes: ['15', '20', '25'] }],
});

describe('process table drafts', () => {
  it('labels bands as the tables print them', () => {
    expect(draftBandLabels(salsaTable())).toEqual(['0–1,000 ft', '1,001–6,000 ft', 'Above 6,000 ft']);
  });

  it('adds a band below the open top, with an empty cell in every row', () => {
    const added = addBand(salsaTable());
    expect(added.bands.map((b) => b.bound)).toEqual(['1000', '6000', '', '']);
    expect(added.rows[0]?.minutes).toEqual(['15', '20', '', '25']);
    expect(draftBandLabels(added)).toEqual(['0–1,000 ft', '1,001–6,000 ft', 'Band 3', 'Above band 3']);
  });

  it('adds at the top of a table that ends in a bound', () => {
    const closed = { ...salsaTable(), openTop: false };
    expect(addBand(closed).rows[0]?.minutes).toEqual(['15', '20', '25', '']);
  });

  it('removes a band and its cells; the band below the removed open top becomes the open one', () => {
    const removed = removeBand(salsaTable(), 2);
    expect(removed.rows[0]?.minutes).toEqual(['15', '20']);
    expect(draftBandLabels(removed)).toEqual(['0–1,000 ft', 'Above 1,000 ft']);
    expect(removeBand({ ...salsaTable(), bands: [{ key: 'a', bound: '' }] }, 0).bands).toHaveLength(1);
  });
});
