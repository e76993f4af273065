import { formatCents } from '@fryline/schemas';

// One readable line per audit entry. Actions not listed here read as their
// own name ("bake_day.published" → "Bake day published").

interface Entry {
  action: string;
  details: Record<string, unknown>;
  subject: string | null;
  /** The shop's currency, for the amounts in the entry. */
  currency?: string;
}

const str = (v: unknown) => (typeof v === 'string' ? v : v === undefined || v === null ? '' : JSON.stringify(v));
const cents = (v: unknown, e: Entry) => (typeof v === 'number' ? formatCents(v, e.currency) : str(v));

const settingNames: Record<string, string> = {
  shopName: 'shop name',
  timeZone: 'time zone',
  currency: 'currency',
  tax: 'tax',
  holdMinutes: 'hold length',
  noShowGraceMinutes: 'no-show grace period',
  refundPolicy: 'refund policy',
  maxPiecesPerCustomer: 'pieces per customer',
};

const fieldNames: Record<string, string> = {
  name: 'name',
  kind: 'kind',
  flavour: 'flavour',
  glaze: 'glaze',
  glazeRecipeId: 'glaze recipe',
  allergens: 'allergens',
  description: 'description',
};

const changedKeys = (details: Record<string, unknown>, names: Record<string, string>) => {
  const changes = details.changes && typeof details.changes === 'object' ? Object.keys(details.changes) : [];
  return changes.map((k) => names[k] ?? k).join(', ');
};

const summaries: Record<string, (e: Entry) => string> = {
  'menu.created': (e) => `Added ${str(e.details.name) || e.subject} to the menu`,
  'menu.updated': (e) => `Changed ${str(e.details.name) || e.subject}: ${changedKeys(e.details, fieldNames)}`,
  'menu.price_changed': (e) => {
    const change = (e.details.surchargeCents ?? {}) as { from?: unknown; to?: unknown };
    return `Changed the extra charge for ${str(e.details.name) || e.subject} from ${cents(change.from, e)} to ${cents(change.to, e)}`;
  },
  'menu.archived': (e) => `Archived ${str(e.details.name) || e.subject}`,
  'menu.restored': (e) => `Put ${str(e.details.name) || e.subject} back on the menu`,
  'menu.photo': (e) => `New photo for ${str(e.details.name) || e.subject}`,
  'menu.photo_removed': (e) => `Removed the photo of ${str(e.details.name) || e.subject}`,
  'staff.role': (e) =>
    e.details.role === 'customer' ? `Removed staff access for ${e.subject ?? 'someone'}` : `Gave ${e.subject ?? 'someone'} the ${str(e.details.role)} role`,
  'staff.invited': (e) => `Invited ${str(e.details.email) || e.subject} as ${str(e.details.role)}`,
  'shop.logo': () => 'Put up a new logo for the shop',
  'shop.logo_removed': () => 'Took down the shop\'s logo',
  'shop.settings': (e) => `Changed the shop settings: ${changedKeys(e.details, settingNames)}`,
  'bake_day.capacity': (e) => `Set the capacity of ${e.subject ?? 'a bake day'} to ${str(e.details.rings)} rings and ${str(e.details.holes)} holes`,
  'bake_day.created': (e) => `Announced the bake day ${e.subject ?? str(e.details.date)}${e.details.publish === false ? ' (draft)' : ''}`,
  'bake_day.published': (e) => `Opened ${e.subject ?? 'a bake day'} to customers`,
  'order.refunded': (e) => `Refunded ${cents(e.details.amountCents, e)} on order ${e.subject ?? ''}${e.details.reason ? ` (${str(e.details.reason)})` : ''}`.trim(),
};

export function summarize(entry: Entry): string {
  const own = summaries[entry.action];
  if (own) return own(entry);
  const [area = '', verb = ''] = entry.action.split('.');
  const words = `${area.replace(/_/g, ' ')} ${verb.replace(/_/g, ' ')}`.trim();
  const line = words.charAt(0).toUpperCase() + words.slice(1);
  return entry.subject ? `${line}: ${entry.subject}` : line;
}
