import { randomUUID } from 'node:crypto';
import type {
  CreateKitchenInput,
  KitchenView,
  MemberView,
  MyMembershipView,
  Role,
  UpdateKitchenInput,
  UpdateMyMembershipInput,
} from '@jarday/contracts';
import type { Altitude, UnitSystem } from '@jarday/rules';
import { Injectable } from '@nestjs/common';
import { AppError, forbidden, notFound } from '../common/app-error.js';
import { type KitchenWithRole, KitchensRepository, type MembershipRow } from './kitchens.repository.js';

export const toKitchenView = (k: KitchenWithRole): KitchenView => ({
  id: k.id,
  name: k.name,
  altitude: { value: k.altitudeValue, unit: k.altitudeUnit },
  units: k.units,
  createdAt: k.createdAt.toISOString(),
  role: k.role,
  memberCount: k.memberCount,
});

const lastLead = () => new AppError('last_lead', 'A kitchen needs at least one lead: make someone else lead first');

/** Parsed create input (zod defaults applied). */
interface CreateKitchen extends Omit<CreateKitchenInput, 'altitude' | 'units'> {
  altitude: Altitude;
  units: UnitSystem;
}

@Injectable()
export class KitchensService {
  constructor(private readonly repo: KitchensRepository) {}

  list(userId: string): KitchenView[] {
    return this.repo.listForUser(userId).map(toKitchenView);
  }

  /** The creator becomes the kitchen's first lead, in the same transaction. */
  create(userId: string, input: CreateKitchen, now = new Date()): KitchenView {
    const id = randomUUID();
    this.repo.transaction(() => {
      this.repo.insertKitchen({
        id,
        name: input.name,
        altitudeValue: input.altitude.value,
        altitudeUnit: input.altitude.unit,
        units: input.units,
        createdAt: now,
      });
      this.repo.insertMembership({ kitchenId: id, userId, role: 'lead', reminders: true, joinedAt: now });
    });
    return this.get(id, userId);
  }

  get(kitchenId: string, userId: string): KitchenView {
    const kitchen = this.repo.findForUser(kitchenId, userId);
    if (!kitchen) throw notFound('Kitchen');
    return toKitchenView(kitchen);
  }

  update(kitchenId: string, userId: string, input: UpdateKitchenInput): KitchenView {
    this.repo.updateKitchen(kitchenId, {
      ...(input.name !== undefined && { name: input.name }),
      ...(input.altitude && { altitudeValue: input.altitude.value, altitudeUnit: input.altitude.unit }),
      ...(input.units && { units: input.units }),
    });
    return this.get(kitchenId, userId);
  }

  members(kitchenId: string): MemberView[] {
    return this.repo.listMembers(kitchenId).map((m) => ({ ...m, joinedAt: m.joinedAt.toISOString() }));
  }

  changeRole(kitchenId: string, targetUserId: string, role: Role): MemberView {
    this.repo.transaction(() => {
      const target = this.repo.findMembership(kitchenId, targetUserId);
      if (!target) throw notFound('Member');
      if (target.role === 'lead' && role !== 'lead' && this.repo.countLeads(kitchenId) <= 1) throw lastLead();
      this.repo.setRole(kitchenId, targetUserId, role);
    });
    const member = this.members(kitchenId).find((m) => m.userId === targetUserId);
    if (!member) throw notFound('Member');
    return member;
  }

  myMembership(m: MembershipRow): MyMembershipView {
    return { kitchenId: m.kitchenId, userId: m.userId, role: m.role, reminders: m.reminders };
  }

  /** Each member decides for themself whether reminders about the kitchen's loads come by e-mail. */
  updateMyMembership(m: MembershipRow, input: UpdateMyMembershipInput): MyMembershipView {
    this.repo.setReminders(m.kitchenId, m.userId, input.reminders);
    const fresh = this.repo.findMembership(m.kitchenId, m.userId);
    if (!fresh) throw notFound('Member');
    return this.myMembership(fresh);
  }

  /** A lead removes anyone; anyone may leave. The last lead can do neither to themself. */
  removeMember(kitchenId: string, actor: MembershipRow, targetUserId: string): void {
    if (actor.role !== 'lead' && actor.userId !== targetUserId) throw forbidden('Only a lead can remove other members');
    this.repo.transaction(() => {
      const target = this.repo.findMembership(kitchenId, targetUserId);
      if (!target) throw notFound('Member');
      if (target.role === 'lead' && this.repo.countLeads(kitchenId) <= 1) throw lastLead();
      this.repo.deleteMembership(kitchenId, targetUserId);
    });
  }
}
