import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { stubFetch } from '../../../testing/fetch-stub';
import { orchardKitchen } from '../../../testing/fixtures';
import { renderWithProviders } from '../../../testing/render';
import { bath, tomatoSalsa, weightedCanner } from '../testing/recipe-fixtures';
import { LocalPlanPanel } from './local-plan-panel';

describe('the plan of a starter, worked out in the browser', () => {
  it('plans the salsa with its own caution, and refuses a canner it was not tested in', async () => {
    const stub = stubFetch({});
    const salsa = tomatoSalsa({ id: 'starter-tomato-salsa', kitchenId: null });
    const { user } = renderWithProviders(
      <LocalPlanPanel kitchen={orchardKitchen} recipe={salsa} canners={[bath, weightedCanner]} />,
    );

    // NCHFP salsa, pints: 20 min at 1,001-6,000 ft (the kitchen is at 1,250 ft).
    expect(screen.getByLabelText('Process time').textContent).toBe('20 minutes');
    expect(screen.getByText('Salsa: change only spices and herbs.')).toBeTruthy();

    await user.selectOptions(screen.getByLabelText('Canner'), weightedCanner.id);
    expect(screen.getByText(/has a tested boiling-water process only; choose a boiling-water canner/)).toBeTruthy();
    expect(screen.queryByLabelText('Process time')).toBeNull();
    expect(stub.requests).toHaveLength(0);
  });
});
