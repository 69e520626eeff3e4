import { describe, expect, it, vi } from 'vitest';
import { liveDeviceId, requestLive, type LiveSocket } from './socket';

const payload = {
  commandId: '2d1c0b9a-8e7f-4a6b-9c5d-4e3f2a1b0c9d',
  dayId: '6f1c2a4e-8d3b-4c5a-9e7f-1a2b3c4d5e6f',
  timerId: '0b7e9d2c-3f4a-4b5c-8d6e-7f8091a2b3c4',
  command: { type: 'rolling-boil' as const },
};

/** A socket whose answers come from a list: a value, or a rejection as socket.io's ack timeout gives. */
function socketAnswering(connected: boolean, answers: unknown[]) {
  const emitWithAck = vi.fn((_event: string, _payload: unknown) => {
    const next = answers.shift();
    return next instanceof Error ? Promise.reject(next) : Promise.resolve(next);
  });
  const socket = { connected, timeout: () => ({ emitWithAck }) } as unknown as LiveSocket;
  return { socket, emitWithAck };
}

describe('requestLive', () => {
  it('never queues a tap while offline: a rolling boil sent minutes late would start the clock wrong', async () => {
    const { socket, emitWithAck } = socketAnswering(false, []);
    const answer = await requestLive(socket, 'timer:command', payload);
    expect(answer).toMatchObject({ error: { code: 'offline' } });
    expect(emitWithAck).not.toHaveBeenCalled();
  });

  it('retries once with the same command id when the server does not answer', async () => {
    const done = { data: { timer: { id: payload.timerId }, noop: false } };
    const { socket, emitWithAck } = socketAnswering(true, [new Error('operation has timed out'), done]);
    expect(await requestLive(socket, 'timer:command', payload)).toEqual(done);
    expect(emitWithAck.mock.calls.map((c) => c[1])).toEqual([payload, payload]);
  });

  it('gives up after the retry and says so', async () => {
    const { socket } = socketAnswering(true, [new Error('timeout'), new Error('timeout')]);
    expect(await requestLive(socket, 'timer:command', payload)).toMatchObject({ error: { code: 'no_answer' } });
  });

  it('passes the server’s refusal through as it came', async () => {
    const refusal = { error: { code: 'invalid_state', message: 'Put the lid on and heat the water first' } };
    const { socket } = socketAnswering(true, [refusal]);
    expect(await requestLive(socket, 'timer:command', payload)).toEqual(refusal);
  });
});

describe('liveDeviceId', () => {
  it('keeps one id per device, in the form the handshake accepts', () => {
    const first = liveDeviceId();
    expect(first).toMatch(/^[A-Za-z0-9_-]{8,64}$/);
    expect(liveDeviceId()).toBe(first);
  });
});
