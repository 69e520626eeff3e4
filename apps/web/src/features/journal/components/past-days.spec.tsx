import type { PastDayView } from '@jarday/contracts';
import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { stubFetch } from '../../../testing/fetch-stub';
import { renderWithProviders } from '../../../testing/render';
import { day, KITCHEN_ID } from '../testing/journal-fixtures';
import { PastDayList, pastDayFigures } from './past-day-list';
import { YesterdayButton } from './yesterday-button';

const past: PastDayView = {
  ...day,
  loadCount: 2,
  loadsProcessed: 2,
  jarsProcessed: 14,
  jarsBySize: [
    { jarSize: 'quart', jars: 7 },
    { jarSize: 'pint', jars: 7 },
  ],
  seals: { checked: 14, sealed: 13, rate: 13 / 14 },
  overrides: 1,
};

describe('past days', () => {
  it('tells each day by its loads, jars by size and seal rate', () => {
    expect(pastDayFigures(past)).toBe('2 of 2 loads processed · 14 jars (7 quart, 7 pint) · seal rate 93%');
    expect(pastDayFigures({ ...past, seals: { checked: 0, sealed: 0, rate: null } })).toContain(
      'seals not checked yet',
    );
  });

  it('lists the days with their journal link and their overrides called out', () => {
    renderWithProviders(<PastDayList days={[past]} journalHref={(d) => `/j/${d.id}`} planHref={(d) => `/p/${d.id}`} />);
    expect(screen.getByRole('link', { name: `Journal: ${day.title}` }).getAttribute('href')).toBe(`/j/${day.id}`);
    expect(screen.getByText('1 safety override')).toBeTruthy();
  });

  it("offers yesterday's day on the kitchen home once a day was closed, and nothing before", async () => {
    stubFetch({ [`GET /api/kitchens/${KITCHEN_ID}/journal/yesterday`]: { status: 200, body: { day: past } } });
    renderWithProviders(<YesterdayButton kitchenId={KITCHEN_ID} href={(id) => `/journal/${id}`} />);
    const link = await screen.findByRole('link', { name: /Yesterday's day: Jam Saturday/ });
    expect(link.getAttribute('href')).toBe(`/journal/${day.id}`);
  });

  it('shows no button when no day has been closed', async () => {
    const stub = stubFetch({
      [`GET /api/kitchens/${KITCHEN_ID}/journal/yesterday`]: { status: 200, body: { day: null } },
    });
    const { container } = renderWithProviders(<YesterdayButton kitchenId={KITCHEN_ID} href={(id) => id} />);
    await expect.poll(() => stub.requests.length).toBe(1);
    expect(container.textContent).toBe('');
  });
});
