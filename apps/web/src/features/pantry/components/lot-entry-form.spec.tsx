import type { LotEntryAnswer } from '@jarday/contracts';
import { screen, waitFor } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { expectFieldError, expectFieldValid } from '../../../testing/assertions';
import { errorBody, stubFetch } from '../../../testing/fetch-stub';
import { renderWithProviders } from '../../../testing/render';
import { entriesPath, entry, KITCHEN_ID, lot } from '../testing/pantry-fixtures';
import { LotEntryForm } from './lot-entry-form';

const POST = `POST ${entriesPath}`;

beforeEach(() => {
  vi.useFakeTimers({ toFake: ['Date'] });
  // Noon on this device's calendar, so "today" is 12 September wherever the test runs.
  vi.setSystemTime(new Date(2025, 8, 12, 12, 0, 0));
});
afterEach(() => vi.useRealTimers());

const answer = (): LotEntryAnswer => ({
  lot: lot({ given: 2, onShelf: 9, entries: [entry()] }),
  entry: entry(),
  caution: null,
});

describe('giving jars away', () => {
  it('asks who the jars went to and how many before sending anything', async () => {
    const stub = stubFetch({});
    const { user } = renderWithProviders(<LotEntryForm kitchenId={KITCHEN_ID} lot={lot()} />);
    await user.type(screen.getByLabelText('How many jars'), '0');
    await user.click(screen.getByRole('button', { name: 'Record the gift' }));
    expectFieldError(screen.getByLabelText('How many jars'), 'At least 1 jar');
    expectFieldError(screen.getByLabelText('Given to'), 'Who were the jars given to?');
    expect(stub.requests).toHaveLength(0);

    await user.clear(screen.getByLabelText('How many jars'));
    await user.type(screen.getByLabelText('How many jars'), '2.5');
    await user.type(screen.getByLabelText('Given to'), '   ');
    await user.click(screen.getByRole('button', { name: 'Record the gift' }));
    expectFieldError(screen.getByLabelText('How many jars'), 'Whole jars');
    expectFieldError(screen.getByLabelText('Given to'), 'Who were the jars given to?');
    expect(stub.requests).toHaveLength(0);
  });

  it('sends the gift with today’s date and clears the form', async () => {
    const stub = stubFetch({ [POST]: { status: 201, body: answer() } });
    const recorded = vi.fn();
    const { user } = renderWithProviders(<LotEntryForm kitchenId={KITCHEN_ID} lot={lot()} onRecorded={recorded} />);
    expect(screen.getByLabelText<HTMLInputElement>('Date').value).toBe('2025-09-12');
    await user.type(screen.getByLabelText('How many jars'), '2');
    await user.type(screen.getByLabelText('Given to'), 'The Alvarez family');
    await user.type(screen.getByLabelText('Note (optional)'), 'With the recipe card');
    await user.click(screen.getByRole('button', { name: 'Record the gift' }));
    await waitFor(() => expect(recorded).toHaveBeenCalledTimes(1));
    expect(stub.to(POST)[0]?.body).toEqual({
      kind: 'gift',
      jars: 2,
      recipient: 'The Alvarez family',
      date: '2025-09-12',
      note: 'With the recipe card',
    });
    expect(screen.getByLabelText<HTMLInputElement>('Given to').value).toBe('');
    expectFieldValid(screen.getByLabelText('How many jars'));
  });

  it('shows the server’s refusal when more jars are given than are on the shelf', async () => {
    const message = 'Lot 250906-A has 11 jars on the shelf, not 12';
    stubFetch({ [POST]: { status: 409, body: errorBody(409, 'not_enough_jars', message) } });
    const { user } = renderWithProviders(<LotEntryForm kitchenId={KITCHEN_ID} lot={lot()} />);
    await user.type(screen.getByLabelText('How many jars'), '12');
    await user.type(screen.getByLabelText('Given to'), 'Grandpa Hollis');
    await user.click(screen.getByRole('button', { name: 'Record the gift' }));
    expect((await screen.findByRole('alert')).textContent).toBe(message);
  });

  it('puts a server’s field message on its field', async () => {
    stubFetch({
      [POST]: {
        status: 400,
        body: errorBody(400, 'validation_failed', 'The jars were canned on 2025-09-06: give that date or later', [
          { path: 'date', message: 'On or after 2025-09-06' },
        ]),
      },
    });
    const { user } = renderWithProviders(<LotEntryForm kitchenId={KITCHEN_ID} lot={lot()} />);
    await user.type(screen.getByLabelText('How many jars'), '1');
    await user.type(screen.getByLabelText('Given to'), 'Sam');
    await user.click(screen.getByRole('button', { name: 'Record the gift' }));
    await waitFor(() => expectFieldError(screen.getByLabelText('Date'), 'On or after 2025-09-06'));
  });
});
