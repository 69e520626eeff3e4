import type { LoadView, NewTimer, PrepStep } from '@jarday/contracts';
import { BLANCH_DIP_MS, MINUTE_MS, SECOND_MS } from '@jarday/live';

/** A one-tap timer a station offers: "Dip 45 s", "Simmer 10 min". */
export interface TimerPreset {
  id: string;
  /** On the button, short: "45 s". */
  label: string;
  /** For screen readers and tests, whole: "Blanch dip 45 s". */
  spoken: string;
  timer: NewTimer;
}

/** Blanch dips for peeling: 30 to 60 seconds in boiling water, or until the skins split (USDA Guide 3). */
export function prepPresets(): TimerPreset[] {
  const mid = (BLANCH_DIP_MS.min + BLANCH_DIP_MS.max) / 2;
  return [BLANCH_DIP_MS.min, mid, BLANCH_DIP_MS.max].map((ms) => ({
    id: `blanch-${ms / SECOND_MS}`,
    label: `${ms / SECOND_MS} s`,
    spoken: `Blanch dip ${ms / SECOND_MS} s`,
    timer: { kind: 'blanch', label: 'Blanch dip', durationMs: ms, startNow: true },
  }));
}

const minutes = (ms: number) => Math.round(ms / MINUTE_MS);

/** The recipes' own simmer times first (as their prep steps give them), then plain round times. */
export function stovePresets(prepSteps: readonly PrepStep[]): TimerPreset[] {
  const own = prepSteps
    .filter((p) => p.kind === 'simmer' && p.seconds !== null)
    .map((p, i) => ({
      id: `simmer-own-${i}`,
      label: `${minutes((p.seconds ?? 0) * SECOND_MS)} min, as the recipe says`,
      spoken: `Simmer ${minutes((p.seconds ?? 0) * SECOND_MS)} min: ${p.label}`,
      timer: {
        kind: 'simmer' as const,
        label: p.label.slice(0, 80),
        durationMs: (p.seconds ?? 0) * SECOND_MS,
        startNow: true,
      },
    }));
  const plain = [5, 10, 15, 20].map((m) => ({
    id: `simmer-${m}`,
    label: `${m} min`,
    spoken: `Simmer ${m} min`,
    timer: { kind: 'simmer' as const, label: `Simmer ${m} min`, durationMs: m * MINUTE_MS, startNow: true },
  }));
  return [...own, ...plain];
}

/**
 * Jars: sterilising when a load's plan needs it (boiling-water processes under 10 minutes, 10 minutes plus one per
 * 1,000 ft above 1,000 ft: USDA Guide 1), and a keep-hot reminder otherwise.
 */
export function jarPresets(loads: readonly LoadView[]): TimerPreset[] {
  const sterilise = loads.map((l) => l.plan.jarPreparation).find((p) => p.sterilise);
  const presets: TimerPreset[] = [];
  if (sterilise?.sterilise) {
    presets.push({
      id: 'sterilise',
      label: `Sterilise ${sterilise.minutes} min`,
      spoken: `Sterilise the jars ${sterilise.minutes} min`,
      timer: {
        kind: 'hot-hold',
        label: `Sterilise jars: boil ${sterilise.minutes} min`,
        durationMs: sterilise.minutes * MINUTE_MS,
        startNow: true,
      },
    });
  }
  for (const m of [30, 60]) {
    presets.push({
      id: `hot-hold-${m}`,
      label: `${m} min`,
      spoken: `Keep jars hot ${m} min`,
      timer: { kind: 'hot-hold', label: 'Jars kept hot', durationMs: m * MINUTE_MS, startNow: true },
    });
  }
  return presets;
}
