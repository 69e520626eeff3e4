#!/usr/bin/env node
/**
 * Synthesises Jarday's alarm tones into WAV files: plain Node, no sound packs, no dependencies. The samples are
 * computed (sine partials under an attack/decay envelope) and written as 16-bit mono PCM in a RIFF/WAVE container,
 * so the same script always writes the same bytes.
 *
 *   node scripts/make-sounds.mjs          write apps/web/public/sounds/*.wav
 *   node scripts/make-sounds.mjs --check  exit 1 if the committed files differ from what the script makes
 *
 * alarm.wav  a 1.6 s loop of three rising notes, bright enough to cut through a range hood; the board loops it
 *            until someone acknowledges.
 * chime.wav  a short soft two-note chime: "sound is on".
 */
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const RATE = 22_050;
const OUT = fileURLToPath(new URL('../apps/web/public/sounds/', import.meta.url));

/** @typedef {{ start: number, length: number, hz: number, level: number }} Note */

/**
 * A note: start and length in seconds, frequency in Hz, peak level 0..1.
 * @param {number} start @param {number} length @param {number} hz @param {number} level
 * @returns {Note}
 */
const note = (start, length, hz, level) => ({ start, length, hz, level });

/**
 * Partials above the fundamental (relative level): a little 2nd and 3rd harmonic makes a tone easy to hear over
 * kitchen noise without the harshness of a square wave.
 */
/** @type {[number, number][]} */
const PARTIALS = [
  [1, 1],
  [2, 0.35],
  [3, 0.12],
];

/** @param {number} t seconds into the note @param {number} length the note's length in seconds */
function envelope(t, length) {
  const attack = 0.008;
  if (t < attack) return t / attack;
  // Exponential decay, and a short fade at the very end so a note never clicks.
  const decay = Math.exp((-3.2 * (t - attack)) / length);
  const tail = Math.min(1, (length - t) / 0.02);
  return decay * Math.max(0, tail);
}

/** @param {number} seconds @param {Note[]} notes @returns {Float64Array} */
function render(seconds, notes) {
  const samples = new Float64Array(Math.round(seconds * RATE));
  const norm = PARTIALS.reduce((sum, [, level]) => sum + level, 0);
  for (const n of notes) {
    const from = Math.round(n.start * RATE);
    const count = Math.round(n.length * RATE);
    for (let i = 0; i < count && from + i < samples.length; i += 1) {
      const t = i / RATE;
      let v = 0;
      for (const [k, level] of PARTIALS) v += level * Math.sin(2 * Math.PI * n.hz * k * t);
      samples[from + i] += (n.level * envelope(t, n.length) * v) / norm;
    }
  }
  return samples;
}

/** @param {Float64Array} samples -1..1 @returns {Buffer} */
function wav(samples) {
  const data = Buffer.alloc(samples.length * 2);
  samples.forEach((v, i) => data.writeInt16LE(Math.round(Math.max(-1, Math.min(1, v)) * 32_767), i * 2));
  const header = Buffer.alloc(44);
  header.write('RIFF', 0, 'ascii');
  header.writeUInt32LE(36 + data.length, 4);
  header.write('WAVE', 8, 'ascii');
  header.write('fmt ', 12, 'ascii');
  header.writeUInt32LE(16, 16); // fmt chunk size
  header.writeUInt16LE(1, 20); // PCM
  header.writeUInt16LE(1, 22); // mono
  header.writeUInt32LE(RATE, 24);
  header.writeUInt32LE(RATE * 2, 28); // byte rate
  header.writeUInt16LE(2, 32); // block align
  header.writeUInt16LE(16, 34); // bits per sample
  header.write('data', 36, 'ascii');
  header.writeUInt32LE(data.length, 40);
  return Buffer.concat([header, data]);
}

// E5, A5, C#6: a rising major figure, repeated with a rest so the loop breathes.
const SOUNDS = {
  'alarm.wav': render(1.6, [
    note(0.0, 0.22, 659.25, 0.85),
    note(0.24, 0.22, 880.0, 0.85),
    note(0.48, 0.4, 1108.73, 0.9),
  ]),
  'chime.wav': render(0.7, [note(0.0, 0.35, 784.0, 0.5), note(0.16, 0.5, 1046.5, 0.45)]),
};

const check = process.argv.includes('--check');
let stale = 0;
mkdirSync(OUT, { recursive: true });
for (const [name, samples] of Object.entries(SOUNDS)) {
  const bytes = wav(samples);
  const path = `${OUT}${name}`;
  if (check) {
    /** @type {Buffer | null} */
    let kept;
    try {
      kept = readFileSync(path);
    } catch {
      kept = null;
    }
    if (!kept || !kept.equals(bytes)) {
      stale += 1;
      console.error(`${name} differs from what scripts/make-sounds.mjs makes: run it and commit the result`);
    }
  } else {
    writeFileSync(path, bytes);
    console.log(`wrote ${name}: ${(samples.length / RATE).toFixed(2)} s, ${bytes.length} bytes`);
  }
}
if (stale > 0) process.exit(1);
