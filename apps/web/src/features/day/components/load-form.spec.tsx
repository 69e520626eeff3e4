import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { errorBody, stubFetch } from '../../../testing/fetch-stub';
import { canner } from '../../../testing/fixtures';
import { renderWithProviders } from '../../../testing/render';
import { batch, DAY_ID, KITCHEN_ID, load } from '../testing/day-fixtures';
import { LoadForm } from './load-form';

const loadsPath = `/api/kitchens/${KITCHEN_ID}/days/${DAY_ID}/loads`;
const waterBath = canner({
  id: '3c2b1a09-8f7e-4d6c-b5a4-9382716a5b4c',
  name: 'Speckled canner',
  capacity: { 'half-pint': 12 },
});
const pressure = canner({
  id: '4d3c2b1a-0f9e-4d7c-a6b5-a493827b6c5d',
  name: 'Tall pressure canner',
  method: 'pressure',
  gauge: 'weighted',
  capacity: { pint: 10 },
});

const setup = (loads = [load({ jars: 4 })]) =>
  renderWithProviders(
    <LoadForm
      kitchenId={KITCHEN_ID}
      dayId={DAY_ID}
      batches={[batch()]}
      loads={loads}
      canners={[waterBath, pressure]}
    />,
  );

describe('making a load', () => {
  it('suggests the jars still to load that the canner holds, and sends them', async () => {
    const stub = stubFetch({ [`POST ${loadsPath}`]: { status: 201, body: load({ number: 2, jars: 8 }) } });
    const { user } = setup();
    expect(screen.getByText('Holds 12 half-pint jars at a time.')).toBeTruthy();
    expect(screen.getByText('Leave empty for 8.')).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'Make load' }));
    await waitFor(() => expect(stub.to(`POST ${loadsPath}`)).toHaveLength(1));
    expect(stub.to(`POST ${loadsPath}`)[0]?.body).toEqual({ batchId: batch().id, cannerId: waterBath.id, jars: 8 });
  });

  it('shows the server’s refusal word for word when the plan is refused', async () => {
    const message = 'Hot-packed jam has a tested boiling-water process only; choose a boiling-water canner.';
    stubFetch({ [`POST ${loadsPath}`]: { status: 409, body: errorBody(409, 'plan_refused', message) } });
    const { user } = setup([]);
    await user.click(screen.getByRole('combobox', { name: 'Canner' }));
    await user.click(screen.getByRole('option', { name: /Tall pressure canner/ }));
    await user.type(screen.getByLabelText('Jars in this load'), '6');
    await user.click(screen.getByRole('button', { name: 'Make load' }));
    expect((await screen.findByTestId('load-refusal')).textContent).toBe(message);
  });

  it('checks the number before sending: whole jars, at least one', async () => {
    const stub = stubFetch({});
    const { user } = setup([]);
    await user.type(screen.getByLabelText('Jars in this load'), '0');
    await user.click(screen.getByRole('button', { name: 'Make load' }));
    expect(await screen.findByText('At least 1 jar')).toBeTruthy();
    expect(stub.requests).toHaveLength(0);
  });
});
