import { act, render, screen } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { move, T0, timer } from '../testing/day-fixtures';
import { useDayTimers } from '../hooks/use-day-timers';
import { formatClock } from '../utils/format-clock';
import { Countdown, TimerProgress } from './countdown';

// A 45-second dip started at T0 by the server's clock.
const dip = move(timer({ kind: 'blanch', label: 'Blanch dip', durationMs: 45_000 }), { type: 'start' }, T0);
// This device's clock runs 5 s behind the server's: server = device + 5 s.
const OFFSET = 5_000;
const deviceAt = (serverMs: number) => serverMs - OFFSET;

describe('the countdown digits', () => {
  beforeEach(() => {
    // 10 s into the dip, by the server.
    vi.useFakeTimers({ now: deviceAt(T0 + 10_000) });
  });
  afterEach(() => {
    vi.useRealTimers();
  });

  it('count from the server’s deadline with the clock offset, so every device shows the same', () => {
    render(<Countdown timer={dip} offsetMs={OFFSET} label="Blanch dip" />);
    expect(screen.getByRole('timer').textContent).toBe('0:35');
  });

  it('would read wrong without the offset: the 5 s of skew show', () => {
    render(<Countdown timer={dip} offsetMs={0} label="Blanch dip" />);
    expect(screen.getByRole('timer').textContent).toBe('0:40');
  });

  it('tick down on their own, second by second', () => {
    render(<Countdown timer={dip} offsetMs={OFFSET} />);
    act(() => {
      vi.advanceTimersByTime(1_000);
    });
    expect(screen.getByRole('timer').textContent).toBe('0:34');
    act(() => {
      vi.advanceTimersByTime(34_000);
    });
    expect(screen.getByRole('timer').textContent).toBe('0:00');
  });

  it('re-render only themselves: the station around them does not render each second', () => {
    let stationRenders = 0;
    // Subscribes to the live store as the board does, so a tick routed through the store would show here.
    function Station() {
      useDayTimers();
      stationRenders += 1;
      return (
        <div>
          <Countdown timer={dip} offsetMs={OFFSET} />
          <TimerProgress timer={dip} offsetMs={OFFSET} />
        </div>
      );
    }
    render(<Station />);
    act(() => {
      vi.advanceTimersByTime(5_000);
    });
    expect(screen.getByRole('timer').textContent).toBe('0:30');
    expect(stationRenders).toBe(1);
  });
});

describe('formatClock', () => {
  it('rounds up to whole seconds, so a time still to wait never reads 0:00', () => {
    expect(formatClock(34_200)).toBe('0:35');
    expect(formatClock(1)).toBe('0:01');
    expect(formatClock(0)).toBe('0:00');
    expect(formatClock(-500)).toBe('0:00');
  });

  it('shows minutes, and hours past the hour', () => {
    expect(formatClock(10 * 60_000)).toBe('10:00');
    expect(formatClock(90 * 60_000)).toBe('1:30:00');
    expect(formatClock(12 * 3_600_000 - 1)).toBe('12:00:00');
  });
});
