import type { RecipeView } from '@jarday/contracts';
import { screen, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { expectFieldError, expectFieldValid } from '../../../testing/assertions';
import { stubFetch } from '../../../testing/fetch-stub';
import { orchardKitchen } from '../../../testing/fixtures';
import { renderWithProviders } from '../../../testing/render';
import { bath, tomatoesInWater } from '../testing/recipe-fixtures';
import { RecipeForm } from './recipe-form';

// The orchard kitchen is at 1,250 ft: the 1,001-3,000 ft band of the USDA Guide 3 tomato table.
const PINT_HOT_BAND_2 = 'Minutes for pint jars, hot pack at 1,001–3,000 ft';

const setup = (recipe: RecipeView = tomatoesInWater()) => {
  stubFetch({});
  return renderWithProviders(
    <RecipeForm kitchen={orchardKitchen} canners={[bath]} recipe={recipe} onSaved={vi.fn()} onCancel={vi.fn()} />,
  );
};

const processTime = () => screen.getByLabelText('Process time').textContent;
const minutesCells = (row: string) => screen.getAllByLabelText(new RegExp(`^Minutes for ${row} at `));

// The whole editor re-checks the draft on each keystroke; in happy-dom that is slow, so these get room to run.
describe('the process table editor', { timeout: 20_000 }, () => {
  it('shows the live plan for the draft, and it follows an edited minutes cell', async () => {
    const { user } = setup();
    // USDA Guide 3: pints of tomatoes in water, 45 min at 1,001-3,000 ft.
    expect(processTime()).toBe('45 minutes');
    expect(screen.queryByText('Saving changed times marks this recipe untested')).toBeNull();

    const cell = screen.getByLabelText(PINT_HOT_BAND_2);
    await user.clear(cell);
    await user.type(cell, '47');

    expect(processTime()).toBe('47 minutes');
    expect(screen.getByText('Saving changed times marks this recipe untested')).toBeTruthy();

    await user.selectOptions(screen.getByLabelText('Jar size and pack'), 'quart/raw');
    expect(processTime()).toBe('50 minutes');
  });

  it('adds a minutes input to every row when a band is added, and removes it with the band', async () => {
    const { user } = setup();
    const rows = ['pint jars, hot pack', 'pint jars, raw pack', 'quart jars, hot pack', 'quart jars, raw pack'];
    for (const row of rows) expect(minutesCells(row)).toHaveLength(4);

    await user.click(screen.getByRole('button', { name: 'Add a band' }));
    for (const row of rows) expect(minutesCells(row)).toHaveLength(5);
    // The new band sits below the open top band, waiting for its bound.
    const bound = screen.getByLabelText('Band 4 upper bound');
    expect((bound as HTMLInputElement).value).toBe('');

    await user.type(bound, '8000');
    expect(screen.getByLabelText('Minutes for quart jars, raw pack at 6,001–8,000 ft')).toBeTruthy();
    expect(screen.getByLabelText('Minutes for quart jars, raw pack at above 8,000 ft')).toBeTruthy();

    await user.click(screen.getByRole('button', { name: 'Remove band 4' }));
    for (const row of rows) expect(minutesCells(row)).toHaveLength(4);
    expect(processTime()).toBe('45 minutes');
  });

  it('puts the schema message on the cell: zero, a fraction, and a time that falls as altitude rises', async () => {
    const { user } = setup();
    const cell = screen.getByLabelText(PINT_HOT_BAND_2);

    await user.clear(cell);
    await user.type(cell, '0');
    expectFieldError(cell, 'A process time must be more than 0 minutes');
    expect(screen.queryByLabelText('Process time')).toBeNull();
    expect(screen.getByText('The plan shows once these are fixed')).toBeTruthy();

    await user.clear(cell);
    await user.type(cell, '12.5');
    expectFieldError(cell, 'Process times are whole minutes');

    // 30 min at 1,001-3,000 ft is shorter than the 40 min below it.
    await user.clear(cell);
    await user.type(cell, '30');
    expectFieldError(cell, 'times never fall as altitude rises');
    expectFieldValid(screen.getByLabelText('Minutes for pint jars, hot pack at 0–1,000 ft'));

    await user.clear(cell);
    await user.type(cell, '45');
    expectFieldValid(cell);
    expect(processTime()).toBe('45 minutes');
  });

  it('flags a band bound that does not rise, at that bound', async () => {
    const { user } = setup();
    const bound = screen.getByLabelText('Band 2 upper bound');
    await user.clear(bound);
    await user.type(bound, '900');
    expectFieldError(bound, 'Band bounds must strictly increase: 900 ft follows 1,000 ft');
  });

  it('shows pressure rows only when the recipe is tested for a pressure canner', async () => {
    const { user } = setup();
    const pressureTable = () => screen.queryByRole('region', { name: 'Pressure table' });
    expect(pressureTable()).toBeNull();

    await user.click(screen.getByRole('checkbox', { name: 'Pressure canner' }));
    const table = pressureTable();
    expect(table).not.toBeNull();
    expect(within(table!).getByLabelText('Pressure minutes for pint jars, hot pack')).toBeTruthy();

    await user.click(screen.getByRole('checkbox', { name: 'Pressure canner' }));
    expect(pressureTable()).toBeNull();
  });
});
