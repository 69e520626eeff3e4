import type { Howl } from 'howler';
import { useSoundStore } from '../stores/sound-store';

type Howler = typeof import('howler');

let module: Promise<Howler> | null = null;
let alarm: Howl | null = null;
let chime: Howl | null = null;
let wanted = false;

const set = (patch: Partial<ReturnType<typeof useSoundStore.getState>>) => useSoundStore.setState(patch);

/** Audio is running when Web Audio's context runs (or howler fell back to HTML5 audio, which has no context). */
function audioRuns(h: Howler): boolean {
  return !h.Howler.usingWebAudio || h.Howler.ctx?.state === 'running';
}

function refresh(h: Howler) {
  const unlocked = audioRuns(h);
  set({ checked: true, unlocked, sounding: wanted && unlocked && Boolean(alarm?.playing()) });
}

/** Loads howler and the tones once; howler itself resumes the audio context at the first tap anywhere. */
function load(): Promise<Howler> {
  module ??= import('howler').then((h) => {
    // Howler suspends audio after 30 s of quiet by default; an alarm must be able to sound at any moment, and some
    // browsers will not resume a suspended context without another tap.
    h.Howler.autoSuspend = false;
    const update = () => refresh(h);
    alarm = new h.Howl({
      src: ['/sounds/alarm.wav'],
      loop: true,
      onplay: update,
      onstop: update,
      onunlock: update,
      onloaderror: () => set({ failed: true }),
      onplayerror: () => {
        set({ failed: true, sounding: false });
        alarm?.once('unlock', () => void setAlarmSounding(wanted));
      },
    });
    chime = new h.Howl({ src: ['/sounds/chime.wav'], volume: 0.7, onunlock: update });
    h.Howler.ctx?.addEventListener('statechange', update);
    update();
    return h;
  });
  return module;
}

/** Start loading the tones early, so the first alarm does not wait for a download. */
export function preloadSound(): void {
  void load();
}

/** The answer to "Tap to turn sound on": resume audio inside the tap, and play the chime to prove it. */
export async function unlockSound(): Promise<void> {
  const h = await load();
  if (h.Howler.ctx && h.Howler.ctx.state !== 'running') await h.Howler.ctx.resume().catch(() => undefined);
  chime?.play();
  refresh(h);
  if (wanted && alarm && !alarm.playing()) alarm.play();
}

/** Loops the alarm while `on`; stops it at once when not. */
export async function setAlarmSounding(on: boolean): Promise<void> {
  wanted = on;
  const h = await load();
  if (!alarm) return;
  if (wanted && !alarm.playing()) {
    set({ failed: false });
    alarm.play();
  } else if (!wanted) {
    alarm.stop();
  }
  refresh(h);
}
