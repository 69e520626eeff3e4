import { CAUTIONS } from '@jarday/rules';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { errorBody, stubFetch } from '../../../testing/fetch-stub';
import { expectFieldError } from '../../../testing/assertions';
import { renderWithProviders } from '../../../testing/render';
import { coolingLoad, KITCHEN_ID, loadPathOf, sealCheck } from '../testing/cooling-fixtures';
import { SealCheckTiles } from './seal-check-tiles';

const PUT = `PUT ${loadPathOf()}/seal-checks`;
const jar = (n: number) => screen.getByRole('button', { name: new RegExp(`^Jar ${n}:`) });

function setup({
  reprocessOpen = true,
  canCheck = true,
  load = coolingLoad(14, { bandsOffAt: new Date().toISOString() }),
} = {}) {
  return renderWithProviders(
    <SealCheckTiles kitchenId={KITCHEN_ID} load={load} reprocessOpen={reprocessOpen} canCheck={canCheck} />,
  );
}

describe('seal check tiles', () => {
  it('moves a jar through sealed, not sealed and broken, each with its own word and shape', async () => {
    stubFetch({});
    const { user } = setup();
    expect(screen.getAllByRole('button', { name: /^Jar \d: not checked$/ })).toHaveLength(6);
    const seen: string[] = [];
    for (let i = 0; i < 4; i += 1) {
      await user.click(jar(3));
      seen.push(`${jar(3).getAttribute('aria-label')} ${jar(3).getAttribute('data-seal')}`);
    }
    expect(seen).toEqual([
      'Jar 3: sealed sealed',
      'Jar 3: not sealed unsealed',
      'Jar 3: broken broken',
      'Jar 3: sealed sealed',
    ]);
    expect(within(jar(3)).getByText('Sealed')).toBeTruthy();
  });

  it('asks where a jar that did not seal goes before saving, shows the caution, then sends every checked jar', async () => {
    const stub = stubFetch({ [PUT]: { status: 200, body: coolingLoad(14) } });
    const { user } = setup();
    await user.click(jar(1));
    await user.click(jar(2));
    await user.click(jar(2));
    expect(screen.getByText(CAUTIONS['unsealed-jar'].title)).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'The other 4 sealed' }));
    await user.click(screen.getByRole('button', { name: 'Save seal checks (6 of 6 jars)' }));
    const choice = screen.getByRole('group', { name: 'Jar 2 did not seal: where does it go?' });
    expect(choice.getAttribute('aria-describedby')).toBeTruthy();
    expectFieldError(choice, 'Choose the fridge or reprocessing for jar 2.');
    expect(stub.requests).toHaveLength(0);

    await user.click(within(choice).getByRole('button', { name: 'Reprocess with a new lid' }));
    await user.click(screen.getByRole('button', { name: 'Save seal checks (6 of 6 jars)' }));
    await waitFor(() => expect(stub.to(PUT)).toHaveLength(1));
    expect(stub.to(PUT)[0]?.body).toEqual({
      jars: [
        { jarNumber: 1, result: 'sealed', outcome: 'store' },
        { jarNumber: 2, result: 'unsealed', outcome: 'reprocess' },
        { jarNumber: 3, result: 'sealed', outcome: 'store' },
        { jarNumber: 4, result: 'sealed', outcome: 'store' },
        { jarNumber: 5, result: 'sealed', outcome: 'store' },
        { jarNumber: 6, result: 'sealed', outcome: 'store' },
      ],
    });
  });

  it('after the 24 hours offers only the fridge for a jar that did not seal, and a broken jar is discarded', async () => {
    const stub = stubFetch({ [PUT]: { status: 200, body: coolingLoad(25) } });
    const { user } = setup({ reprocessOpen: false });
    await user.click(jar(1));
    await user.click(jar(1));
    await user.click(jar(4));
    await user.click(jar(4));
    await user.click(jar(4));
    const choice = screen.getByRole('group', { name: 'Jar 1 did not seal: where does it go?' });
    expect(within(choice).getByRole('button', { name: 'Reprocess with a new lid' })).toHaveProperty('disabled', true);
    expect(within(choice).getByRole('button', { name: 'Fridge, eat within days' }).getAttribute('aria-pressed')).toBe(
      'true',
    );
    await user.click(screen.getByRole('button', { name: 'Save seal checks (2 of 6 jars)' }));
    await waitFor(() => expect(stub.to(PUT)).toHaveLength(1));
    expect(stub.to(PUT)[0]?.body).toEqual({
      jars: [
        { jarNumber: 1, result: 'unsealed', outcome: 'fridge' },
        { jarNumber: 4, result: 'broken', outcome: 'discard' },
      ],
    });
  });

  it('starts from the saved checks, saves only a change, and shows the server’s refusal as it comes', async () => {
    const message = 'Load 2 holds 6 jars, numbered 1 to 6';
    stubFetch({ [PUT]: { status: 400, body: errorBody(400, 'validation_failed', message) } });
    const load = coolingLoad(14, {
      bandsOffAt: new Date().toISOString(),
      sealChecks: [sealCheck({ jarNumber: 5, result: 'broken', outcome: 'discard' })],
    });
    const { user } = setup({ load });
    expect(jar(5).getAttribute('aria-label')).toBe('Jar 5: broken');
    expect(screen.getByRole('button', { name: 'Saved: 1 of 6 jars checked' })).toHaveProperty('disabled', true);
    await user.click(jar(1));
    await user.click(screen.getByRole('button', { name: 'Save seal checks (2 of 6 jars)' }));
    expect((await screen.findByRole('alert')).textContent).toBe(message);
  });

  it('lets a watcher see the jars but not change them', () => {
    stubFetch({});
    setup({ canCheck: false });
    expect(jar(1)).toHaveProperty('disabled', true);
    expect(screen.queryByRole('button', { name: /Save seal checks/ })).toBeNull();
  });
});
