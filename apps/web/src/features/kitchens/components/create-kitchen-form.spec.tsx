import type { KitchenView } from '@jarday/contracts';
import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { expectFieldError, expectFieldValid } from '../../../testing/assertions';
import { stubFetch } from '../../../testing/fetch-stub';
import { orchardKitchen } from '../../../testing/fixtures';
import { renderWithProviders } from '../../../testing/render';
import { CreateKitchenForm } from './create-kitchen-form';

// libs/rules accepts -1,500 to 15,000 ft; 15,000 ft x 0.3048 m/ft (NIST Handbook 44, App. C) = 4,572 m.
const RANGE_MESSAGE = 'Altitude must be between -1500 and 15000 ft (-457 to 4,572 m)';

const setup = () => {
  const onCreated = vi.fn();
  const r = renderWithProviders(<CreateKitchenForm onCreated={onCreated} />);
  return {
    ...r,
    onCreated,
    name: screen.getByLabelText('Kitchen name'),
    altitude: screen.getByLabelText('Altitude'),
    submit: screen.getByRole('button', { name: 'Start kitchen' }),
  };
};

describe('CreateKitchenForm', () => {
  it('asks for a name and a numeric altitude', async () => {
    const stub = stubFetch({});
    const { user, name, altitude, submit } = setup();

    await user.type(altitude, 'high');
    await user.click(submit);

    expectFieldError(name, 'Name is required');
    expectFieldError(altitude, 'Altitude must be a number');
    expect(stub.requests).toHaveLength(0);
  });

  it('accepts 5,000 in feet but refuses 5,000 in metres (above 4,572 m)', async () => {
    const created: KitchenView = { ...orchardKitchen, altitude: { value: 5000, unit: 'ft' } };
    const stub = stubFetch({ 'POST /api/kitchens': { status: 201, body: created } });
    const { user, name, altitude, submit, onCreated } = setup();

    await user.type(name, 'Orchard Lane kitchen');
    await user.type(altitude, '5000');
    await user.click(screen.getByRole('button', { name: 'Metres' }));
    expect(screen.getByRole('button', { name: 'Metres' }).getAttribute('aria-pressed')).toBe('true');
    await user.click(submit);

    expectFieldError(altitude, RANGE_MESSAGE);
    expect(stub.requests).toHaveLength(0);

    await user.click(screen.getByRole('button', { name: 'Feet' }));
    await user.click(submit);

    await waitFor(() => expect(onCreated).toHaveBeenCalledWith(created));
    expectFieldValid(altitude);
    expect(stub.to('POST /api/kitchens')[0]?.body).toEqual({
      name: 'Orchard Lane kitchen',
      altitude: { value: 5000, unit: 'ft' },
      units: 'us',
    });
  });

  it('sends a metric altitude and preference as chosen', async () => {
    const stub = stubFetch({ 'POST /api/kitchens': { status: 201, body: orchardKitchen } });
    const { user, name, altitude, submit, onCreated } = setup();

    await user.type(name, 'Hill hut');
    await user.type(altitude, '1372');
    await user.click(screen.getByRole('button', { name: 'Metres' }));
    await user.click(screen.getByRole('radio', { name: /Metric/ }));
    await user.click(submit);

    await waitFor(() => expect(onCreated).toHaveBeenCalled());
    expect(stub.to('POST /api/kitchens')[0]?.body).toEqual({
      name: 'Hill hut',
      altitude: { value: 1372, unit: 'm' },
      units: 'metric',
    });
  });

  it('refuses an altitude below -1,500 ft', async () => {
    const stub = stubFetch({});
    const { user, name, altitude, submit } = setup();

    await user.type(name, 'Shore kitchen');
    await user.type(altitude, '-1600');
    await user.click(submit);

    expectFieldError(altitude, RANGE_MESSAGE);
    expect(stub.requests).toHaveLength(0);
  });
});
