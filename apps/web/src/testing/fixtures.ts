import type { CannerView, InviteView, KitchenView, MemberView, SessionView, UserView } from '@jarday/contracts';

/** Invented people and kitchens, shaped by the contract types. */
export const ada: UserView = {
  id: '0b9d7c3e-5a41-4f7e-9c1a-2f6d8e4b7a10',
  email: 'ada.fenwick@example.test',
  name: 'Ada Fenwick',
  createdAt: '2025-08-02T09:15:00.000Z',
};

export const sessionFor = (user: UserView, accessToken = 'access-token-1'): SessionView => ({
  user,
  accessToken,
  accessTokenExpiresAt: new Date(Date.now() + 15 * 60_000).toISOString(),
});

export const orchardKitchen: KitchenView = {
  id: '5f3c2b1a-7d6e-4c8b-9a0f-1e2d3c4b5a69',
  name: 'Orchard Lane kitchen',
  altitude: { value: 1250, unit: 'ft' },
  units: 'us',
  createdAt: '2025-08-02T09:20:00.000Z',
  role: 'lead',
  memberCount: 3,
};

export const member = (over: Partial<MemberView> = {}): MemberView => ({
  userId: ada.id,
  name: ada.name,
  email: ada.email,
  role: 'lead',
  joinedAt: '2025-08-02T09:20:00.000Z',
  ...over,
});

export const invite = (over: Partial<InviteView> = {}): InviteView => ({
  id: '9a8b7c6d-5e4f-4a3b-8c2d-1e0f9a8b7c6d',
  code: 'K7QM-3RTX',
  role: 'helper',
  createdAt: '2025-08-03T10:00:00.000Z',
  expiresAt: '2025-08-10T10:00:00.000Z',
  createdByName: ada.name,
  ...over,
});

export const canner = (over: Partial<CannerView> = {}): CannerView => ({
  id: '3c2b1a09-8f7e-4d6c-b5a4-9382716a5b4c',
  kitchenId: orchardKitchen.id,
  name: 'Big blue pot',
  method: 'boiling-water',
  gauge: null,
  capacity: { quart: 7, pint: 9 },
  waterLitres: null,
  burnerWatts: null,
  createdAt: '2025-08-02T09:30:00.000Z',
  ...over,
});
