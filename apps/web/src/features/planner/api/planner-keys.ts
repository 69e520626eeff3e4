import type { PlanRequest } from '@jarday/contracts';

export const plansPath = (kitchenId: string) => `/kitchens/${encodeURIComponent(kitchenId)}/plans`;

export const plannerKeys = {
  all: ['plans'] as const,
  preview: (kitchenId: string, request: PlanRequest | null) => ['plans', kitchenId, 'preview', request] as const,
};
