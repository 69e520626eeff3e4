import { create } from 'zustand';

/**
 * Whether this device can make a sound: browsers keep audio locked until a person has tapped the page, so the board
 * shows "Tap to turn sound on" until `unlocked`. `sounding` is true only while the alarm loop really plays.
 */
interface SoundState {
  /** False until the audio has been looked at (howler loaded): nothing is offered before that. */
  checked: boolean;
  unlocked: boolean;
  sounding: boolean;
  /** The device could not play the alarm (no audio, or the file did not load). */
  failed: boolean;
}

export const useSoundStore = create<SoundState>()(() => ({
  checked: false,
  unlocked: false,
  sounding: false,
  failed: false,
}));
