import { screen, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { stubFetch } from '../../../testing/fetch-stub';
import { renderWithProviders } from '../../../testing/render';
import { coolingDay, coolingLoad, KITCHEN_ID, shelfOf } from '../testing/cooling-fixtures';
import { CoolingShelf } from './cooling-shelf';

const SERVER_NOW = new Date('2025-09-07T02:00:00.000Z');
const HOUR_MS = 3600_000;

beforeEach(() => {
  vi.useFakeTimers({ toFake: ['Date'] });
  vi.setSystemTime(SERVER_NOW);
});
afterEach(() => vi.useRealTimers());

const render = (shelf: ReturnType<typeof shelfOf>) =>
  renderWithProviders(
    <CoolingShelf
      kitchenId={KITCHEN_ID}
      role="helper"
      shelf={shelf}
      canners={[]}
      boardPath={(dayId) => `/board/${dayId}`}
    />,
  );

describe('the cooling shelf', () => {
  it('counts down to the bands on the server’s clock, even when this device’s clock is two hours slow', () => {
    stubFetch({});
    const resting = coolingLoad(9);
    const ready = coolingLoad(13, { loadId: 'd4e5f6a7-b8c9-4d0e-8f1a-223344556677', number: 1 });
    // The device reads 2 h earlier than the server: the shelf must still say 3 h left, not 5 h.
    vi.setSystemTime(SERVER_NOW.getTime() - 2 * HOUR_MS);
    render({ ...shelfOf([resting, ready]), offsetMs: 2 * HOUR_MS });

    const restingCard = screen.getByRole('article', { name: 'Load 2 · Hot-packed jam' });
    expect(within(restingCard).getByTestId('load-times').getAttribute('data-stage')).toBe('resting');
    expect(within(restingCard).getByRole('timer').textContent).toMatch(/^Bands may come off in 3 h \(/);
    expect(within(restingCard).getByText(/^Lifted out 9 h ago/)).toBeTruthy();
    expect(within(restingCard).getByText(/^Best at 24 hours: in 15 h/)).toBeTruthy();

    const readyCard = screen.getByRole('article', { name: 'Load 1 · Hot-packed jam' });
    expect(within(readyCard).getByText('Bands may come off now')).toBeTruthy();
    expect(within(readyCard).getByText(/^Best at 24 hours: in 11 h/)).toBeTruthy();
  });

  it('shows the day’s seal rate and, for jars that did not seal, the reprocess deadline', () => {
    stubFetch({});
    const load = coolingLoad(14, {
      bandsOffAt: SERVER_NOW.toISOString(),
      sealChecks: [
        { jarNumber: 1, result: 'sealed', outcome: 'store', checkedAt: SERVER_NOW.toISOString(), byName: 'Ada' },
        { jarNumber: 2, result: 'unsealed', outcome: 'fridge', checkedAt: SERVER_NOW.toISOString(), byName: 'Ada' },
      ],
    });
    render(shelfOf([load], [coolingDay({ sealRate: { checked: 8, sealed: 7, rate: 7 / 8 } })]));
    expect(screen.getByTestId('seal-rate').textContent).toBe('88% sealed · 7 of 8 jars checked');
    expect(screen.getByText(/^Unsealed jars: reprocess in 10 h/)).toBeTruthy();
  });

  it('says so when nothing is cooling', () => {
    stubFetch({});
    render(shelfOf([], []));
    expect(screen.getByText(/No jars on the cooling shelf/)).toBeTruthy();
  });
});
