import type { StepKey, StepMark } from '@jarday/contracts';
import { act, screen } from '@testing-library/react';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '../../../testing/render';
import type { StepSubject } from '../hooks/use-confirm-step';
import { useLiveStore } from '../stores/live-store';
import { DAY_ID, load, LOAD_ID, move, processTimer, T0 } from '../testing/day-fixtures';
import { emptyDay } from '../utils/live-state';
import { loadSteps, timerStepDone } from '../utils/steps';
import { StepGuide } from './step-guide';

const jam = load();
const by = { userId: 'user-helper-bo', name: 'Bo' };
let clock = T0;
const tick = (step: StepKey, done = true): StepMark => ({
  subject: 'load',
  subjectId: LOAD_ID,
  step,
  done,
  at: (clock += 1000),
  by,
});

/** Answers as the server does: the tick comes back, and the store takes it. */
const confirm = vi.fn((_who: StepSubject, step: StepKey, done: boolean): Promise<string | null> => {
  useLiveStore.getState().putMark(tick(step, done));
  return Promise.resolve(null);
});

function setup(process = processTimer(), canCommand = true) {
  return renderWithProviders(
    <StepGuide
      name="Load 1"
      steps={loadSteps(jam)}
      who={{ subject: 'load', id: LOAD_ID }}
      confirm={confirm}
      timerDone={(id) => timerStepDone(id, { process, rest: null, cooling: null })}
      headspace={jam.plan.headspace}
      canCommand={canCommand}
    />,
  );
}

describe('the step guide', () => {
  beforeEach(() => {
    useLiveStore.setState(emptyDay(DAY_ID));
    confirm.mockClear();
  });

  it('starts at filling, with the burn caution; "Next step" ticks it on the server and moves on', async () => {
    const { user } = setup();
    expect(screen.getByTestId('current-step').textContent).toBe('Fill the hot jars');
    expect(screen.getByRole('note').textContent).toContain('Hot jars and steam burn');

    await user.click(screen.getByRole('button', { name: 'Next step: Load 1' }));
    expect(confirm).toHaveBeenCalledWith({ subject: 'load', id: LOAD_ID }, 'fill', true);
    expect(screen.getByTestId('current-step').textContent).toBe('Leave 1/4 in (6 mm) headspace');
    expect(screen.getByTestId('headspace-picture')).toBeTruthy();

    await user.click(screen.getByRole('button', { name: 'Back a step' }));
    expect(confirm).toHaveBeenLastCalledWith({ subject: 'load', id: LOAD_ID }, 'fill', false);
    expect(screen.getByTestId('current-step').textContent).toBe('Fill the hot jars');
  });

  it('moves on when another device ticks the step', () => {
    setup();
    act(() => {
      useLiveStore.getState().putMark(tick('fill'));
      useLiveStore.getState().putMark(tick('headspace'));
    });
    expect(screen.getByTestId('current-step').textContent).toBe('Free the air bubbles');
  });

  it('follows the canner: once the load processes, the filling steps are behind it and the buttons move it on', () => {
    const running = move(move(processTimer(), { type: 'water-heating' }, T0), { type: 'rolling-boil' }, T0 + 60_000);
    setup(running);
    expect(screen.getByTestId('current-step').textContent).toBe('Process 10 min');
    expect(screen.getByText('This step moves on with the canner’s buttons.')).toBeTruthy();
    expect(screen.queryByRole('button', { name: /Next step/ })).toBeNull();
    // The process step carries the altitude the time was set for.
    expect(screen.getByText(/Timed for 2,350 ft/)).toBeTruthy();
  });

  it('lists every step with what is done, and offers watchers no buttons to tick', async () => {
    useLiveStore.getState().putMark(tick('fill'));
    useLiveStore.getState().putMark(tick('headspace'));
    const { user } = setup(processTimer(), false);
    expect(screen.queryByRole('button', { name: /Next step/ })).toBeNull();
    await user.click(screen.getByRole('button', { name: 'All steps' }));
    const items = screen.getAllByRole('listitem').map((li) => li.textContent);
    expect(items).toHaveLength(loadSteps(jam).length);
    expect(items[0]).toContain('(done)');
    expect(items[2]).toContain('Free the air bubbles (now)');
    expect(items.at(-1)).toContain('Cooling shelf');
  });

  it('shows the server’s refusal when a tick is refused', async () => {
    confirm.mockResolvedValueOnce('This canning day is closed: its record is read-only.');
    const { user } = setup();
    await user.click(screen.getByRole('button', { name: 'Next step: Load 1' }));
    expect(await screen.findByText('This canning day is closed: its record is read-only.')).toBeTruthy();
    expect(screen.getByTestId('current-step').textContent).toBe('Fill the hot jars');
  });
});
