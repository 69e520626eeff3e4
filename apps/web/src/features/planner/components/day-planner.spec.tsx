import {
  rulesOf,
  type DayPlanView,
  type DayView,
  type PlanPreviewAnswer,
  type PlanRequest,
  type RecipeView,
} from '@jarday/contracts';
import { estimateComeUp, planDay } from '@jarday/rules';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { stubFetch, type RecordedRequest } from '../../../testing/fetch-stub';
import { canner, orchardKitchen } from '../../../testing/fixtures';
import { renderWithProviders } from '../../../testing/render';
import { clock } from '../utils/planner-labels';
import { DayPlanner } from './day-planner';

/** Whole tomatoes in water as the starter set has them (USDA Guide 3: 40/45/50/55 min pints; 13 lb per 9 pints). */
const tomatoes: RecipeView = {
  id: 'b1b2c3d4-e5f6-4a7b-8c9d-0e1f2a3b4c5d',
  kitchenId: orchardKitchen.id,
  copiedFrom: 'starter-tomatoes-in-water',
  createdAt: '2025-09-01T10:00:00.000Z',
  updatedAt: '2025-09-01T10:00:00.000Z',
  name: 'Whole tomatoes in water',
  category: 'tomatoes',
  productClass: 'acid',
  acidification: 'tomato',
  tested: true,
  source: { citation: 'USDA Complete Guide to Home Canning, Guide 3', url: null },
  headspaceInches: 0.5,
  processing: {
    boilingWater: {
      bands: [1000, 3000, 6000, null],
      rows: [{ jarSize: 'pint', pack: 'hot', minutes: [40, 45, 50, 55] }],
    },
  },
  prepSteps: [{ kind: 'blanch', label: 'Dip until the skins split', seconds: 60 }],
  ingredients: [],
  notes: '',
  batchYields: [],
  produceYields: [{ jarSize: 'pint', jars: 9, produce: { value: 13, unit: 'lb' } }],
};
const pot = canner({ capacity: { pint: 9 } });
const altitude = { value: 2350, unit: 'ft' } as const;
const path = `/api/kitchens/${orchardKitchen.id}/plans`;

/** The server's answer, made by the real rules from the request: a fake of the transport, not of the planning. */
function answer(req: RecordedRequest): { status: number; body: PlanPreviewAnswer } {
  const body = req.body as PlanRequest;
  const comeUp = estimateComeUp({ altitude });
  const { ms: _ms, ...comeUpView } = comeUp;
  const canners = [{ id: pot.id, name: pot.name, method: pot.method, comeUp: comeUpView }];
  const result = planDay({
    batches: body.batches.map((b) => ({ ...b, recipe: rulesOf(tomatoes), prepSteps: tomatoes.prepSteps })),
    canners: [{ ...pot, comeUpMs: comeUp.ms }],
    altitude,
    startAt: new Date(body.startAt),
  });
  if (!result.ok) return { status: 200, body: { ok: false, reasons: result.reasons, canners } };
  const p = result.plan;
  const json = JSON.parse(JSON.stringify(p)) as Omit<DayPlanView, 'altitude' | 'startAt' | 'canners' | 'batches'>;
  const batches = p.batches.map((b) => ({ ...b, recipeId: tomatoes.id, tested: true }));
  return { status: 200, body: { ok: true, plan: { ...json, altitude, startAt: body.startAt, canners, batches } } };
}

const setup = (canStart = true) => {
  const onStarted = vi.fn();
  const r = renderWithProviders(
    <DayPlanner
      kitchenId={orchardKitchen.id}
      canStart={canStart}
      recipes={[tomatoes]}
      canners={[pot]}
      initial={{ date: '2026-08-15', time: '08:00' }}
      onStarted={onStarted}
    />,
  );
  return { ...r, onStarted };
};

describe('DayPlanner', () => {
  it('plans 18 pints: sends the request, shows heating start, loads, the come-up source and the timeline', async () => {
    const stub = stubFetch({ [`POST ${path}/preview`]: answer });
    const { user } = setup();
    await user.type(screen.getByLabelText('Jars 1'), '18');

    const heading = await screen.findByRole('heading', { name: 'The plan' });
    expect(heading).toBeTruthy();
    const sent = stub.to(`POST ${path}/preview`).at(-1)?.body as PlanRequest;
    expect(sent).toEqual({
      batches: [{ recipeId: tomatoes.id, jarSize: 'pint', pack: 'hot', jars: 18 }],
      cannerIds: [pot.id],
      startAt: new Date('2026-08-15T08:00').toISOString(),
    });
    const plan = (answer({ body: sent } as RecordedRequest).body as { plan: DayPlanView }).plan;
    const heat = screen.getByText('Start heating the canner water').parentElement as HTMLElement;
    expect(within(heat).getByText(clock(plan.heatingStartAt))).toBeTruthy();
    expect(screen.getByText('Load 1 · Big blue pot · 9 pint jars')).toBeTruthy();
    expect(screen.getByText('Load 2 · Big blue pot · 9 pint jars')).toBeTruthy();
    const comeUp = screen.getByRole('region', { name: 'Come-up (lid on to rolling boil)' });
    expect(comeUp.textContent).toContain(
      'Big blue pot: 30 min · published range 20–30 min, no history: the plan allows 30 min',
    );
    const steps = within(screen.getByRole('list', { name: 'Steps of the day' })).getAllByRole('listitem');
    expect(steps).toHaveLength(plan.steps.length);
    expect(steps[0]?.textContent).toContain('Whole tomatoes in water: Dip until the skins split · about 15 min');
    expect(steps.at(-1)?.textContent).toContain('Bands may come off (12 h after the last lift)');
  });

  it('sends produce weight when planned by weight', async () => {
    const stub = stubFetch({ [`POST ${path}/preview`]: answer });
    const { user } = setup();
    await user.click(screen.getByRole('button', { name: 'Produce weight' }));
    await user.type(screen.getByLabelText('Produce 1 (lb)'), '26');
    await screen.findByText('18 pint jars');
    expect((stub.to(`POST ${path}/preview`).at(-1)?.body as PlanRequest).batches[0]).toEqual({
      recipeId: tomatoes.id,
      jarSize: 'pint',
      pack: 'hot',
      produce: { value: 26, unit: 'lb' },
    });
  });

  it('shows a field error and sends nothing for a bad jar count', async () => {
    const stub = stubFetch({});
    const { user } = setup();
    await user.click(screen.getByLabelText('Jars 1'));
    await user.paste('2.5');
    expect(await screen.findByText('Whole jars')).toBeTruthy();
    expect(stub.requests).toHaveLength(0);
  });

  it('starts the day with the plan, its date and name, and hands the day back', async () => {
    const day = { id: 'd1', kitchenId: orchardKitchen.id } as DayView;
    const stub = stubFetch({ [`POST ${path}/preview`]: answer, [`POST ${path}/start`]: { status: 201, body: day } });
    const { user, onStarted } = setup();
    await user.type(screen.getByLabelText('Jars 1'), '9');
    await user.click(await screen.findByRole('button', { name: 'Start this day' }));
    await waitFor(() => expect(onStarted).toHaveBeenCalledWith(day));
    expect(stub.to(`POST ${path}/start`)[0]?.body).toMatchObject({
      date: '2026-08-15',
      title: 'Canning day',
      cannerIds: [pot.id],
      batches: [{ jars: 9 }],
    });
  });

  it('shows the rules’ refusal, and no start button to anyone but a lead', async () => {
    stubFetch({
      [`POST ${path}/preview`]: {
        status: 200,
        body: {
          ok: false,
          reasons: [{ code: 'method-mismatch', message: 'Choose a pressure canner.', batchIndex: 0 }],
          canners: [],
        },
      },
    });
    const { user } = setup(false);
    await user.type(screen.getByLabelText('Jars 1'), '9');
    expect(await screen.findByText('Choose a pressure canner.')).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Start this day' })).toBeNull();
  });
});
