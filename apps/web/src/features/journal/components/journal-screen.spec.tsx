import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { stubFetch } from '../../../testing/fetch-stub';
import { renderWithProviders } from '../../../testing/render';
import { DAY_ID, journalFixtures, KITCHEN_ID, REASON } from '../testing/journal-fixtures';
import { JournalScreen } from './journal-screen';
import { useState } from 'react';
import type { JournalQuery } from '@jarday/contracts';

const base = `/api/kitchens/${KITCHEN_ID}/days/${DAY_ID}`;

function Harness() {
  const [filter, setFilter] = useState<JournalQuery>({});
  return <JournalScreen kitchenId={KITCHEN_ID} dayId={DAY_ID} filter={filter} onFilter={setFilter} />;
}

function setup() {
  const { journal, review } = journalFixtures();
  // The stub keys on the path; the filter travels in the query string of the latest call.
  const lastUrl = () => stub.fetchMock.mock.calls.at(-1)?.[0] as string;
  const stub = stubFetch({
    [`GET ${base}/summary`]: { status: 200, body: review },
    [`GET ${base}/journal`]: () => {
      const kind = new URL(lastUrl(), 'http://jarday.test').searchParams.get('kind');
      return { status: 200, body: journal((e) => !kind || e.kind === kind) };
    },
  });
  return { stub, ...renderWithProviders(<Harness />) };
}

describe('the Journal screen', () => {
  it('shows the summary: loads, jars by size, seal rate and how long the alarm rang', async () => {
    setup();
    expect(await screen.findByText('1 of 1')).toBeTruthy();
    expect(screen.getByText('6 half-pint')).toBeTruthy();
    expect(screen.getByText('75%')).toBeTruthy();
    expect(screen.getByText('3 of 4 jars sealed')).toBeTruthy();
    const rings = screen.getByRole('heading', { name: 'How long each alarm rang' }).parentElement!;
    expect(within(rings).getByText('20 s')).toBeTruthy();
    expect(within(rings).getByText(/answered by Teo Vance/)).toBeTruthy();
  });

  it('highlights the safety override with its reason in a warning', async () => {
    setup();
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain(`Reason: ${REASON}`);
    expect(alert.textContent).toContain('Load 1: rest in the open canner: 2 min instead of at least 5 min');
    expect(alert.className).toMatch(/Warning/);
  });

  it('lists entries in plain words with who and which device, and a kind chip narrows them', async () => {
    const { user, stub } = setup();
    const list = await screen.findByRole('list', { name: 'Journal entries' });
    expect(
      within(list).getByText('Load 1: Hot-packed jam: Full rolling boil confirmed: the process time counts from now'),
    ).toBeTruthy();
    expect(within(list).getAllByText(/Teo Vance on device tablet-0/).length).toBeGreaterThan(0);
    expect(within(list).getAllByText(/Jarday on the server/).length).toBe(2);
    await user.click(screen.getByRole('button', { name: 'Alarms' }));
    const total = journalFixtures().journal().total;
    expect(await screen.findByText(`2 of ${total} entries`)).toBeTruthy();
    expect(stub.fetchMock.mock.calls.at(-1)?.[0]).toContain('/journal?kind=alarm');
    expect(screen.getByRole('button', { name: 'Alarms' }).getAttribute('aria-pressed')).toBe('true');
  });
});
