import { beforeEach, describe, expect, it, vi } from 'vitest';
import { useSoundStore } from '../stores/sound-store';

/**
 * A stand-in for howler's two parts the board uses: a Web Audio context that the browser keeps suspended until a tap,
 * and Howl instances that report play and stop through their callbacks as howler does.
 */
const audio = vi.hoisted(() => {
  type Options = { src: string[]; loop?: boolean; onplay?: () => void; onstop?: () => void; onunlock?: () => void };
  const listeners: (() => void)[] = [];
  const ctx = {
    state: 'suspended' as 'suspended' | 'running',
    addEventListener: (_: string, fn: () => void) => listeners.push(fn),
    resume: () => {
      ctx.state = 'running';
      listeners.forEach((fn) => fn());
      return Promise.resolve();
    },
  };
  const howls: { src: string; loop: boolean; playing: boolean }[] = [];
  class Howl {
    private readonly record: { src: string; loop: boolean; playing: boolean };
    constructor(private readonly options: Options) {
      this.record = { src: options.src[0] ?? '', loop: options.loop ?? false, playing: false };
      howls.push(this.record);
    }
    playing() {
      return this.record.playing;
    }
    play() {
      this.record.playing = this.record.loop;
      this.options.onplay?.();
    }
    stop() {
      this.record.playing = false;
      this.options.onstop?.();
    }
    once() {
      return this;
    }
  }
  const Howler = { usingWebAudio: true, autoSuspend: true, ctx };
  return { ctx, howls, module: { Howl, Howler } };
});
vi.mock('howler', () => audio.module);

const { setAlarmSounding, unlockSound } = await import('./alarm-sound');

describe('the alarm sound', () => {
  beforeEach(() => useSoundStore.setState({ checked: false, unlocked: false, sounding: false, failed: false }));

  it('offers the tap while the browser keeps audio locked, and does not claim to sound', async () => {
    await setAlarmSounding(true);
    expect(useSoundStore.getState()).toMatchObject({ checked: true, unlocked: false, sounding: false });
    // Howler must not put the context to sleep between alarms.
    expect(audio.module.Howler.autoSuspend).toBe(false);
  });

  it('after the tap, the alarm loops until it is acknowledged', async () => {
    await setAlarmSounding(true);
    await unlockSound();
    expect(audio.ctx.state).toBe('running');
    expect(useSoundStore.getState()).toMatchObject({ unlocked: true, sounding: true });
    const loop = audio.howls.find((h) => h.src === '/sounds/alarm.wav');
    expect(loop).toMatchObject({ loop: true, playing: true });

    await setAlarmSounding(false);
    expect(loop?.playing).toBe(false);
    expect(useSoundStore.getState().sounding).toBe(false);
  });
});
