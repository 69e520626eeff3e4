import { CAUTIONS } from '@jarday/rules';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { stubFetch } from '../../../testing/fetch-stub';
import { renderWithProviders } from '../../../testing/render';
import { useLot } from '../api/get-lot';
import { entriesPath, entry, KITCHEN_ID, lot, LOT_ID } from '../testing/pantry-fixtures';
import { LotDetail } from './lot-detail';

const POST = `POST ${entriesPath}`;
const caution = CAUTIONS['spoiled-lot'];

/** The lot page as the route shows it: the lot from the query cache. */
function LotFromCache() {
  const query = useLot(KITCHEN_ID, LOT_ID);
  return query.data ? <LotDetail kitchenId={KITCHEN_ID} role="helper" lot={query.data} /> : null;
}

describe('a spoilage report', () => {
  it('shows the botulism caution before the report is sent, then flags the whole lot', async () => {
    const spoiled = entry({ kind: 'spoiled', jars: 1, recipient: null, note: 'Lid bulging' });
    const flagged = lot({ spoiled: 1, onShelf: 10, flaggedAt: '2025-10-01T09:00:00.000Z', entries: [spoiled] });
    const stub = stubFetch({
      [`GET /api/kitchens/${KITCHEN_ID}/lots/${LOT_ID}`]: { status: 200, body: lot() },
      [POST]: {
        status: 201,
        body: { lot: flagged, entry: spoiled, caution: { ...caution, source: caution.source ?? '' } },
      },
    });
    const { user } = renderWithProviders(<LotFromCache />);
    await screen.findByRole('button', { name: 'Spoiled' });
    expect(screen.queryByTestId('spoilage-caution')).toBeNull();

    await user.click(screen.getByRole('button', { name: 'Spoiled' }));
    const shown = screen.getByTestId('spoilage-caution');
    expect(within(shown).getByText(caution.title)).toBeTruthy();
    expect(shown.textContent).toContain('Do not taste the food');
    expect(shown.textContent).toContain('double-bagged');
    expect(shown.textContent).toContain(`Source: ${caution.source}`);

    await user.type(screen.getByLabelText('How many jars'), '1');
    await user.type(screen.getByLabelText('What did you see? (optional)'), 'Lid bulging');
    await user.click(screen.getByRole('button', { name: 'Report spoilage' }));
    await waitFor(() => expect(stub.to(POST)).toHaveLength(1));
    expect(stub.to(POST)[0]?.body).toMatchObject({ kind: 'spoiled', jars: 1, note: 'Lid bulging' });
    expect(stub.to(POST)[0]?.body).not.toHaveProperty('recipient');

    // The answer replaces the lot in the cache: the page now carries the flag and the caution at its top.
    await waitFor(() =>
      expect(screen.getAllByTestId('spoilage-caution')[0]!.textContent).toContain(
        'look carefully at every other jar before opening it',
      ),
    );
    expect(screen.getByText(/1 jar spoiled/)).toBeTruthy();
  });

  it('stays on a flagged lot for everyone, watchers included', () => {
    stubFetch({});
    renderWithProviders(
      <LotDetail kitchenId={KITCHEN_ID} role="watcher" lot={lot({ flaggedAt: '2025-10-01T09:00:00.000Z' })} />,
    );
    expect(within(screen.getByTestId('spoilage-caution')).getByText(caution.title)).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Report spoilage' })).toBeNull();
  });
});
