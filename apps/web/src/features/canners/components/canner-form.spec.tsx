import type { CannerView } from '@jarday/contracts';
import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { describedText, expectFieldError } from '../../../testing/assertions';
import { stubFetch } from '../../../testing/fetch-stub';
import { canner, orchardKitchen } from '../../../testing/fixtures';
import { renderWithProviders } from '../../../testing/render';
import { CannerForm } from './canner-form';

const cannersPath = `/api/kitchens/${orchardKitchen.id}/canners`;
const GAUGE_MESSAGE = 'A pressure canner needs a gauge type (weighted or dial); a boiling-water canner has none';

const setup = (existing?: CannerView) => {
  const onSaved = vi.fn();
  const r = renderWithProviders(<CannerForm kitchenId={orchardKitchen.id} canner={existing} onSaved={onSaved} />);
  return { ...r, onSaved };
};

describe('CannerForm', () => {
  it('offers no gauge for a boiling-water canner and sends gauge null', async () => {
    const saved = canner();
    const stub = stubFetch({ [`POST ${cannersPath}`]: { status: 201, body: saved } });
    const { user, onSaved } = setup();

    expect(screen.queryByRole('radiogroup', { name: 'Gauge' })).toBeNull();
    await user.type(screen.getByLabelText('Canner name'), 'Big blue pot');
    await user.type(screen.getByLabelText('Quart jars'), '7');
    await user.type(screen.getByLabelText('Pint jars'), '9');
    await user.click(screen.getByRole('button', { name: 'Add canner' }));

    await waitFor(() => expect(onSaved).toHaveBeenCalledWith(saved));
    expect(stub.to(`POST ${cannersPath}`)[0]?.body).toEqual({
      name: 'Big blue pot',
      method: 'boiling-water',
      gauge: null,
      capacity: { quart: 7, pint: 9 },
      waterLitres: null,
      burnerWatts: null,
    });
  });

  it('requires a gauge for a pressure canner, and warns about dial gauges', async () => {
    const saved = canner({ name: 'Steel pressure canner', method: 'pressure', gauge: 'dial', capacity: { quart: 7 } });
    const stub = stubFetch({ [`POST ${cannersPath}`]: { status: 201, body: saved } });
    const { user, onSaved } = setup();

    await user.type(screen.getByLabelText('Canner name'), 'Steel pressure canner');
    await user.click(screen.getByRole('radio', { name: 'Pressure canner' }));
    await user.type(screen.getByLabelText('Quart jars'), '7');
    await user.click(screen.getByRole('button', { name: 'Add canner' }));

    const gauge = screen.getByRole('radiogroup', { name: 'Gauge' });
    expect(describedText(gauge)).toContain(GAUGE_MESSAGE);
    expect(stub.requests).toHaveLength(0);
    expect(screen.queryByText(/Check the dial gauge every year/)).toBeNull();

    await user.click(screen.getByRole('radio', { name: 'Dial gauge' }));
    expect(screen.getByRole('note').textContent).toContain('Check the dial gauge every year');
    await user.click(screen.getByRole('button', { name: 'Add canner' }));

    await waitFor(() => expect(onSaved).toHaveBeenCalledWith(saved));
    expect(stub.to(`POST ${cannersPath}`)[0]?.body).toEqual({
      name: 'Steel pressure canner',
      method: 'pressure',
      gauge: 'dial',
      capacity: { quart: 7 },
      waterLitres: null,
      burnerWatts: null,
    });
  });

  it('drops the gauge again when switched back to boiling water', async () => {
    const stub = stubFetch({ [`POST ${cannersPath}`]: { status: 201, body: canner() } });
    const { user, onSaved } = setup();

    await user.type(screen.getByLabelText('Canner name'), 'Big blue pot');
    await user.click(screen.getByRole('radio', { name: 'Pressure canner' }));
    await user.click(screen.getByRole('radio', { name: 'Weighted gauge' }));
    await user.click(screen.getByRole('radio', { name: 'Boiling-water canner' }));
    await user.type(screen.getByLabelText('Pint jars'), '9');
    await user.click(screen.getByRole('button', { name: 'Add canner' }));

    await waitFor(() => expect(onSaved).toHaveBeenCalled());
    expect(stub.to(`POST ${cannersPath}`)[0]?.body).toMatchObject({ method: 'boiling-water', gauge: null });
  });

  it('needs at least one jar size, whole jars, and at most 40', async () => {
    const stub = stubFetch({});
    const { user } = setup();
    const submit = screen.getByRole('button', { name: 'Add canner' });

    await user.type(screen.getByLabelText('Canner name'), 'Big blue pot');
    await user.click(submit);
    const capacity = screen.getByRole('group', { name: 'Jars per load' });
    expect(describedText(capacity)).toContain('Give the capacity for at least one jar size');

    await user.type(screen.getByLabelText('Quart jars'), '2.5');
    await user.type(screen.getByLabelText('Half-gallon jars'), '41');
    await user.click(submit);
    expectFieldError(screen.getByLabelText('Quart jars'), 'Whole jars only');
    expectFieldError(screen.getByLabelText('Half-gallon jars'), 'At most 40 jars');

    await user.clear(screen.getByLabelText('Quart jars'));
    await user.type(screen.getByLabelText('Quart jars'), '0');
    await user.click(submit);
    expectFieldError(screen.getByLabelText('Quart jars'), 'At least 1 jar');
    expect(stub.requests).toHaveLength(0);
  });

  it('edits a canner whole with PUT', async () => {
    const existing = canner({ method: 'pressure', gauge: 'weighted', capacity: { pint: 9 } });
    const stub = stubFetch({ [`PUT ${cannersPath}/${existing.id}`]: { status: 200, body: existing } });
    const { user, onSaved } = setup(existing);

    expect(screen.getByLabelText<HTMLInputElement>('Pint jars').value).toBe('9');
    await user.type(screen.getByLabelText('Quart jars'), '7');
    await user.click(screen.getByRole('button', { name: 'Save canner' }));

    await waitFor(() => expect(onSaved).toHaveBeenCalled());
    expect(stub.to(`PUT ${cannersPath}/${existing.id}`)[0]?.body).toEqual({
      name: existing.name,
      method: 'pressure',
      gauge: 'weighted',
      capacity: { pint: 9, quart: 7 },
      waterLitres: null,
      burnerWatts: null,
    });
  });

  it('sends water and burner figures for the planner, and checks their ranges', async () => {
    const existing = canner({ waterLitres: 20, burnerWatts: 3000 });
    const stub = stubFetch({ [`PUT ${cannersPath}/${existing.id}`]: { status: 200, body: existing } });
    const { user, onSaved } = setup(existing);

    const water = screen.getByLabelText<HTMLInputElement>('Water in the canner (litres)');
    const burner = screen.getByLabelText<HTMLInputElement>('Burner power (watts)');
    expect([water.value, burner.value]).toEqual(['20', '3000']);
    expect(describedText(water)).toContain('1 inch over the jars');
    await user.clear(water);
    await user.type(water, '0.5');
    await user.clear(burner);
    await user.type(burner, '99000');
    await user.click(screen.getByRole('button', { name: 'Save canner' }));
    expectFieldError(water, 'At least 1 L');
    expectFieldError(burner, 'At most 10,000 W');
    expect(stub.requests).toHaveLength(0);

    await user.clear(water);
    await user.type(water, '18.5');
    await user.clear(burner);
    await user.click(screen.getByRole('button', { name: 'Save canner' }));
    await waitFor(() => expect(onSaved).toHaveBeenCalled());
    expect(stub.to(`PUT ${cannersPath}/${existing.id}`)[0]?.body).toMatchObject({
      waterLitres: 18.5,
      burnerWatts: null,
    });
  });
});
