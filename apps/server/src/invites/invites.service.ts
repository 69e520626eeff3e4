import { randomInt, randomUUID } from 'node:crypto';
import {
  type CreatedInviteView,
  INVITE_CODE_ALPHABET,
  type InvitePreview,
  type InviteView,
  type KitchenView,
} from '@jarday/contracts';
import type { Role } from '@jarday/contracts';
import { Injectable } from '@nestjs/common';
import { AppError, notFound } from '../common/app-error.js';
import { type AppConfig, InjectConfig } from '../config/app-config.js';
import { linkBase, type RequestOrigin } from '../mail/links.js';
import { inviteMail } from '../mail/mail-templates.js';
import { MailService } from '../mail/mail.service.js';
import { KitchensRepository } from '../kitchens/kitchens.repository.js';
import { KitchensService } from '../kitchens/kitchens.service.js';
import { type InviteRow, InvitesRepository } from './invites.repository.js';

const CODE_LENGTH = 8;
/** Shown as XXXX-XXXX so it can be read aloud across a kitchen. */
export const displayCode = (code: string) => `${code.slice(0, 4)}-${code.slice(4)}`;

const toView = (row: InviteRow, createdByName: string): InviteView => ({
  id: row.id,
  code: displayCode(row.code),
  role: row.role,
  createdAt: row.createdAt.toISOString(),
  expiresAt: row.expiresAt.toISOString(),
  createdByName,
});

const inviteNotFound = () =>
  new AppError('invite_not_found', 'This invite does not exist, has expired or was already used');

@Injectable()
export class InvitesService {
  constructor(
    private readonly invites: InvitesRepository,
    private readonly kitchensRepo: KitchensRepository,
    private readonly kitchens: KitchensService,
    private readonly mail: MailService,
    @InjectConfig() private readonly config: AppConfig,
  ) {}

  /** A new invite; with an e-mail address, its link is mailed there after the answer (a failed send is logged). */
  create(
    kitchenId: string,
    createdBy: string,
    input: { role: Exclude<Role, 'lead'>; expiresInDays: number; email?: string | undefined },
    origin?: RequestOrigin,
    now = new Date(),
  ): CreatedInviteView {
    const invite = this.insertNew(kitchenId, createdBy, input, now);
    if (!input.email || !this.mail.enabled) return { ...invite, emailedTo: null };
    this.mail.sendLater(
      inviteMail({
        to: input.email,
        kitchenName: this.kitchensRepo.findKitchenName(kitchenId) ?? 'a kitchen',
        role: invite.role,
        invitedBy: invite.createdByName,
        link: `${linkBase(this.config, origin)}/join/${invite.code.replace(/-/g, '')}`,
        code: invite.code,
        expiresAt: new Date(invite.expiresAt),
      }),
    );
    return { ...invite, emailedTo: input.email };
  }

  private insertNew(
    kitchenId: string,
    createdBy: string,
    input: { role: Exclude<Role, 'lead'>; expiresInDays: number },
    now: Date,
  ): InviteView {
    // 31^8 codes: a collision is rare, but the unique index is the judge; try again on one.
    for (let attempt = 0; attempt < 5; attempt++) {
      const row: InviteRow = {
        id: randomUUID(),
        kitchenId,
        code: Array.from(
          { length: CODE_LENGTH },
          () => INVITE_CODE_ALPHABET[randomInt(INVITE_CODE_ALPHABET.length)],
        ).join(''),
        role: input.role,
        createdBy,
        createdAt: now,
        expiresAt: new Date(now.getTime() + input.expiresInDays * 86_400_000),
        redeemedBy: null,
        redeemedAt: null,
        revokedAt: null,
      };
      if (this.invites.insert(row)) return toView(row, this.invites.findCreatorName(row));
    }
    throw new Error('Could not find a free invite code');
  }

  listOpen(kitchenId: string, now = new Date()): InviteView[] {
    return this.invites.listOpen(kitchenId, now).map((r) => toView(r.invite, r.createdByName));
  }

  revoke(kitchenId: string, inviteId: string, now = new Date()): void {
    if (!this.invites.revoke(kitchenId, inviteId, now)) throw notFound('Invite');
  }

  preview(code: string, userId: string, now = new Date()): InvitePreview {
    const invite = this.invites.findOpenByCode(code, now);
    if (!invite) throw inviteNotFound();
    const kitchenName = this.kitchensRepo.findKitchenName(invite.kitchenId) ?? '';
    return {
      kitchenId: invite.kitchenId,
      kitchenName,
      role: invite.role,
      expiresAt: invite.expiresAt.toISOString(),
      alreadyMember: this.kitchensRepo.findMembership(invite.kitchenId, userId) !== undefined,
    };
  }

  /** Joins the kitchen with the invite's role; a member already in it keeps their role and the invite stays open. */
  redeem(code: string, userId: string, now = new Date()): KitchenView {
    const kitchenId = this.kitchensRepo.transaction(() => {
      const invite = this.invites.findOpenByCode(code, now);
      if (!invite) throw inviteNotFound();
      if (this.kitchensRepo.findMembership(invite.kitchenId, userId)) return invite.kitchenId;
      if (!this.invites.markRedeemed(invite.id, userId, now)) throw inviteNotFound();
      this.kitchensRepo.insertMembership({
        kitchenId: invite.kitchenId,
        userId,
        role: invite.role,
        reminders: true,
        joinedAt: now,
      });
      return invite.kitchenId;
    });
    return this.kitchens.get(kitchenId, userId);
  }
}
