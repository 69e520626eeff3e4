import { screen } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '../../../testing/render';
import { batch, fired, load, move, processTimer, T0 } from '../testing/day-fixtures';
import { CannerStation } from './canner-station';

const jam = load();
const canner = { cannerId: jam.cannerId!, name: jam.cannerName, loads: [jam] };

function setup(timers = [processTimer()], canCommand = true) {
  const run = vi.fn(() => Promise.resolve(null));
  const confirm = vi.fn(() => Promise.resolve(null));
  const r = renderWithProviders(
    <CannerStation
      canner={canner}
      timers={timers}
      batches={[batch()]}
      confirm={confirm}
      run={run}
      canCommand={canCommand}
      planHref="/plan"
    />,
  );
  return { ...r, run };
}

describe('a canner station', () => {
  it('waiting for the boil: says so in words and shape, shows the full time, and offers "Rolling boil"', async () => {
    const heating = move(processTimer(), { type: 'water-heating' }, T0);
    const { user, run } = setup([heating]);
    expect(screen.getByText('Heating: waiting for a rolling boil')).toBeTruthy();
    expect(screen.getByTestId('load-timer').querySelector('[data-shape="hourglass"]')).toBeTruthy();
    expect(screen.getByRole('timer').textContent).toBe('10:00');
    await user.click(screen.getByRole('button', { name: 'Rolling boil: load 1' }));
    expect(run).toHaveBeenCalledWith(
      expect.objectContaining({ timerId: heating.id, command: { type: 'rolling-boil' } }),
    );
  });

  it('tells what the timer is for: the recipe, its tested time and the altitude band', () => {
    setup();
    expect(screen.getByText('For Hot-packed jam: 10 min at 2,350 ft (1,001–6,000 ft band)')).toBeTruthy();
    expect(screen.getByText('Load 1 · Hot-packed jam · 6 half-pint jars')).toBeTruthy();
  });

  it('when the time is up, asks for heat off and lid off', () => {
    const done = fired(move(move(processTimer(), { type: 'water-heating' }, T0), { type: 'rolling-boil' }, T0));
    setup([done]);
    expect(screen.getByText('Time is up')).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Heat off, lid off: load 1' })).toBeTruthy();
  });

  it('shows a watcher the state but no buttons', () => {
    setup([move(processTimer(), { type: 'water-heating' }, T0)], false);
    expect(screen.getByText('Heating: waiting for a rolling boil')).toBeTruthy();
    expect(screen.queryByRole('button', { name: /Rolling boil/ })).toBeNull();
  });
});
