import { describe, expect, it } from 'vitest';
import { applyTimerCommand } from './apply.js';
import type { TimerResult } from './commands.js';
import { commandFingerprint, decideCommand, type CommandRecord } from './idempotency.js';
import { boilingWater, cmd, ctx, HELPER, MIN, run, T0 } from './testing/fixtures.js';

const ID_A = '5b0c6f4e-2a1d-4e3f-9b8a-7c6d5e4f3a2b';
const ID_B = '9e8d7c6b-5a4f-4e3d-8c2b-1a0f9e8d7c6b';

describe('commandFingerprint', () => {
  it('ignores key order and unset fields, but not values', () => {
    const a = commandFingerprint({ event: 'timer:command', payload: { type: 'add-time', addMs: 60_000 } });
    const b = commandFingerprint({
      payload: { addMs: 60_000, type: 'add-time', override: undefined },
      event: 'timer:command',
    });
    expect(a).toBe(b);
    expect(a).toBe('{"event":"timer:command","payload":{"addMs":60000,"type":"add-time"}}');
    expect(commandFingerprint({ payload: { type: 'add-time', addMs: 120_000 } })).not.toBe(
      commandFingerprint({ payload: { type: 'add-time', addMs: 60_000 } }),
    );
    expect(commandFingerprint([{ b: 1, a: [2, { d: 3, c: 4 }] }])).toBe('[{"a":[2,{"c":4,"d":3}],"b":1}]');
  });
});

describe('decideCommand', () => {
  const fingerprint = commandFingerprint({ event: 'timer:command', actorId: HELPER, payload: { type: 'add-time' } });
  const answer = { ok: true } as const;
  const row: CommandRecord<typeof answer> = { commandId: ID_A, fingerprint, answer };

  it('applies a command it has not seen', () => {
    expect(decideCommand(undefined, ID_A, fingerprint)).toEqual({ action: 'apply' });
    expect(decideCommand(row, ID_B, fingerprint)).toEqual({ action: 'apply' });
  });

  it('replays the recorded answer for a retry of the same command', () => {
    expect(decideCommand(row, ID_A, fingerprint)).toEqual({ action: 'replay', answer });
  });

  it('refuses an id reused for another command', () => {
    expect(decideCommand(row, ID_A, commandFingerprint({ other: true }))).toEqual({
      action: 'refuse',
      error: { code: 'command_id_reused', message: 'This command id was already used for a different command.' },
    });
  });

  it('with the ledger, a retried "Boil lost" resets once even after the boil came back', () => {
    // 0:10 boil lost (id A); 0:12 rolling boil again; 0:13 the first phone's retry of id A arrives.
    const ledger = new Map<string, CommandRecord<TimerResult>>();
    const send = (timer: Parameters<typeof applyTimerCommand>[0], id: string, at: number) => {
      const print = commandFingerprint({ event: 'timer:command', actorId: HELPER, payload: cmd.boilLost });
      const decision = decideCommand(ledger.get(id), id, print);
      if (decision.action === 'replay') return decision.answer;
      const result = applyTimerCommand(timer, cmd.boilLost, ctx(at));
      ledger.set(id, { commandId: id, fingerprint: print, answer: result });
      return result;
    };
    const running = run(run(boilingWater(), cmd.heating, T0), cmd.boil, T0);
    const first = send(running, ID_A, T0 + 10 * MIN);
    if (!first.ok) throw new Error('expected the first press to succeed');
    const again = run(first.timer, cmd.boil, T0 + 12 * MIN);
    const retry = send(again, ID_A, T0 + 13 * MIN);
    expect(retry).toBe(first);
    // Without the ledger the retry would have been a fresh loss and a second restart.
    expect(applyTimerCommand(again, cmd.boilLost, ctx(T0 + 13 * MIN))).toMatchObject({ ok: true, noop: false });
  });
});
