import type { ReminderKind, Role } from '@jarday/contracts';
import type { MailMessage } from './mail.service.js';

const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

/** A block of the HTML body: a paragraph, or a link shown as a button-sized target. */
type Block = { p: string } | { link: string; label: string } | { list: string[] };

/** Builds both bodies from the same blocks, so the plain text and the HTML never say different things. */
function compose(to: string, subject: string, blocks: Block[], footer: string): MailMessage {
  const text = blocks
    .map((b) => ('p' in b ? b.p : 'link' in b ? `${b.label}: ${b.link}` : b.list.map((l) => `- ${l}`).join('\n')))
    .concat(['--', footer])
    .join('\n\n');
  const body = blocks
    .map((b) => {
      if ('p' in b) return `<p>${escapeHtml(b.p)}</p>`;
      if ('list' in b) return `<ul>${b.list.map((l) => `<li>${escapeHtml(l)}</li>`).join('')}</ul>`;
      const href = escapeHtml(b.link);
      return `<p><a href="${href}" style="display:inline-block;padding:12px 20px;background:#2f5d50;color:#fff;border-radius:8px;text-decoration:none;font-weight:600">${escapeHtml(b.label)}</a></p><p style="color:#555">${href}</p>`;
    })
    .join('\n');
  const html = `<!doctype html><html><body style="font-family:system-ui,sans-serif;font-size:16px;line-height:1.5;color:#222;max-width:36em">\n${body}\n<hr><p style="color:#666;font-size:14px">${escapeHtml(footer)}</p></body></html>`;
  return { to, subject, text, html };
}

const ROLE_WORDS: Record<Exclude<Role, 'lead'>, string> = {
  helper: 'a helper (runs timers and ticks steps)',
  watcher: 'a watcher (follows the board)',
};

/** The invite: who asked, which kitchen, which role, and the link that joins it. */
export function inviteMail(input: {
  to: string;
  kitchenName: string;
  role: Exclude<Role, 'lead'>;
  invitedBy: string;
  link: string;
  code: string;
  expiresAt: Date;
}): MailMessage {
  return compose(
    input.to,
    `Join ${input.kitchenName} on Jarday`,
    [
      { p: `${input.invitedBy} invites you to ${input.kitchenName} on Jarday, the kitchen's shared timer board.` },
      { p: `You would join as ${ROLE_WORDS[input.role]}.` },
      { link: input.link, label: 'Join the kitchen' },
      {
        p: `Or type the code ${input.code} on the join page. The invite works once, until ${input.expiresAt.toUTCString()}.`,
      },
    ],
    'You get this because a lead of the kitchen typed your address. If you did not expect it, ignore it.',
  );
}

const REMINDER_FOOTER =
  'You get reminders as a member of the kitchen. Turn them off on the kitchen\u2019s Members page.';

/** A reminder about one load: its bands, or the last hours to reprocess its unsealed jars. */
export function reminderMail(input: {
  to: string;
  kind: ReminderKind;
  kitchenName: string;
  loadNumber: number;
  recipeName: string;
  dayDate: string;
  liftedAt: Date;
  deadline: Date;
  link: string;
}): MailMessage {
  const load = `Load ${input.loadNumber} (${input.recipeName}, ${input.dayDate})`;
  if (input.kind === 'bands-ready') {
    return compose(
      input.to,
      `${input.kitchenName}: bands may come off load ${input.loadNumber}`,
      [
        { p: `${load} came out of the canner at ${input.liftedAt.toUTCString()}, 12 hours ago or more.` },
        {
          p: 'The bands may come off now. Then test every seal: press the lid centre (it should not flex), tap it, look at it. Waiting until 24 hours is better if the jars are still warm.',
        },
        { link: input.link, label: 'Open the cooling shelf' },
      ],
      REMINDER_FOOTER,
    );
  }
  return compose(
    input.to,
    `${input.kitchenName}: 2 hours left to reprocess load ${input.loadNumber}`,
    [
      { p: `${load} has jars marked for reprocessing, and no load has carried them again yet.` },
      {
        p: `Unsealed jars may be reprocessed within 24 hours of coming out of the canner: until ${input.deadline.toUTCString()}. Use a new lid and the full process time.`,
      },
      {
        p: 'After that, put them in the fridge and eat them within several days, or freeze them. When in doubt, ask your local extension service.',
      },
      { link: input.link, label: 'Open the cooling shelf' },
    ],
    REMINDER_FOOTER,
  );
}

/** The short record of a closed day: what went through the canners, and the seals if any were checked. */
export function daySummaryMail(input: {
  to: string;
  kitchenName: string;
  dayDate: string;
  dayTitle: string;
  loads: { number: number; recipeName: string; jars: number }[];
  seals: { checked: number; sealed: number };
  link: string;
}): MailMessage {
  const jars = input.loads.reduce((n, l) => n + l.jars, 0);
  const lines = input.loads.map((l) => `Load ${l.number}: ${l.recipeName}, ${l.jars} jar${l.jars === 1 ? '' : 's'}`);
  const seals =
    input.seals.checked === 0
      ? 'No seals have been checked yet: check each jar once the bands come off.'
      : `Seals checked so far: ${input.seals.sealed} of ${input.seals.checked} sealed (${Math.round((100 * input.seals.sealed) / input.seals.checked)} %).`;
  return compose(
    input.to,
    `${input.kitchenName}: ${input.dayTitle} is closed`,
    [
      { p: `The canning day of ${input.dayDate}, "${input.dayTitle}", was closed.` },
      {
        p: `${input.loads.length} load${input.loads.length === 1 ? '' : 's'}, ${jars} jar${jars === 1 ? '' : 's'} in all.`,
      },
      ...(lines.length > 0 ? [{ list: lines }] : []),
      { p: seals },
      { link: input.link, label: 'Open the day' },
    ],
    'You get this as a member of the kitchen.',
  );
}
