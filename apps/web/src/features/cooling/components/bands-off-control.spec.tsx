import type { Role } from '@jarday/contracts';
import { bandGate } from '@jarday/rules';
import { screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { expectFieldError } from '../../../testing/assertions';
import { errorBody, stubFetch } from '../../../testing/fetch-stub';
import { renderWithProviders } from '../../../testing/render';
import { coolingLoad, KITCHEN_ID, loadPathOf } from '../testing/cooling-fixtures';
import { BandsOffControl } from './bands-off-control';

const POST = `POST ${loadPathOf()}/bands-off`;
const NOW = new Date('2025-09-07T02:00:00.000Z');

beforeEach(() => {
  vi.useFakeTimers({ toFake: ['Date'] });
  vi.setSystemTime(NOW);
});
afterEach(() => vi.useRealTimers());

/** A load lifted 9 hours ago, refused as the server refuses it: with the rules' own message. */
function tooEarly() {
  const load = coolingLoad(9);
  const gate = bandGate(new Date(load.liftedAt), NOW);
  if (gate.allowed) throw new Error('the load should still be resting');
  return { load, message: gate.message };
}

const setup = (role: Role, load = tooEarly().load) =>
  renderWithProviders(<BandsOffControl kitchenId={KITCHEN_ID} load={load} role={role} />);

describe('taking the bands off', () => {
  it('shows a helper the server’s refusal word for word, and no way round it', async () => {
    const { load, message } = tooEarly();
    expect(message).toContain('3 h');
    stubFetch({ [POST]: { status: 409, body: errorBody(409, 'bands_too_early', message) } });
    const { user } = setup('helper', load);
    await user.click(screen.getByRole('button', { name: 'Bands off: load 2' }));
    expect((await screen.findByTestId('bands-refusal')).textContent).toBe(message);
    expect(screen.getByText('Only a lead can take the bands off earlier, with a reason.')).toBeTruthy();
    expect(screen.queryByRole('button', { name: /early/ })).toBeNull();
  });

  it('lets a lead override only with a written reason, after a warning', async () => {
    const { load, message } = tooEarly();
    const reason = 'The shelf is needed for the next canner load';
    const stub = stubFetch({
      [POST]: (request) =>
        request.body && (request.body as { override?: unknown }).override
          ? { status: 200, body: { ...load, bandsOffAt: NOW.toISOString(), bandsOffOverride: reason } }
          : { status: 409, body: errorBody(409, 'bands_too_early', message) },
    });
    const { user } = setup('lead', load);
    await user.click(screen.getByRole('button', { name: 'Bands off: load 2' }));
    await user.click(await screen.findByRole('button', { name: 'Take them off early (lead)' }));

    const dialog = screen.getByRole('dialog', { name: 'Take the bands off load 2 early?' });
    expect(within(dialog).getByText('The jars have not cooled 12 hours')).toBeTruthy();
    expect(within(dialog).getByText(message)).toBeTruthy();
    await user.click(within(dialog).getByRole('button', { name: 'Take the bands off early' }));
    expectFieldError(
      within(dialog).getByLabelText('Why now? (kept in the journal)'),
      'Write the reason in a few words (at least 5 characters)',
    );
    expect(stub.to(POST)).toHaveLength(1);

    await user.type(within(dialog).getByLabelText('Why now? (kept in the journal)'), reason);
    await user.click(within(dialog).getByRole('button', { name: 'Take the bands off early' }));
    await waitFor(() => expect(stub.to(POST)).toHaveLength(2));
    expect(stub.to(POST)[1]?.body).toEqual({ override: { reason } });
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
  });

  it('shows when the bands came off, and the lead’s reason when it was early', () => {
    stubFetch({});
    const load = coolingLoad(10, {
      bandsOffAt: NOW.toISOString(),
      bandsOffOverride: 'The shelf is needed for the next canner load',
    });
    setup('helper', load);
    expect(screen.getByText(/^Bands off at/)).toBeTruthy();
    expect(
      screen.getByText('Taken off early by a lead. Reason: The shelf is needed for the next canner load'),
    ).toBeTruthy();
    expect(screen.queryByRole('button', { name: /Bands off/ })).toBeNull();
  });

  it('gives a watcher no button', () => {
    stubFetch({});
    setup('watcher');
    expect(screen.queryByRole('button')).toBeNull();
  });
});
