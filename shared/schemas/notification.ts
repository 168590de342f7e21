import { z } from 'zod';
import type { Role } from '../permissions';
import { listSchema } from './common';

export const notificationKinds = ['parts-ready', 'recoat-closing', 'session-changed', 'daily-plan', 'upkeep-due', 'crew-due'] as const;
export type NotificationKind = (typeof notificationKinds)[number];

export const notificationKindLabels: Record<NotificationKind, string> = {
  'parts-ready': 'Parts of a job are ready to handle',
  'recoat-closing': 'A recoat window is closing with parts still waiting',
  'session-changed': 'A spray session of mine is booked, moved or cancelled',
  'daily-plan': 'The day’s plan, each morning',
  'upkeep-due': 'Booth upkeep falls due: filters near their limit, an extraction test or fire inspection',
  'crew-due': 'A fit test, health surveillance or training falls due (mine; a lead’s or owner’s whole crew)',
};

export const notifyPrefsSchema = z.object({
  'parts-ready': z.boolean(),
  'recoat-closing': z.boolean(),
  'session-changed': z.boolean(),
  'daily-plan': z.boolean(),
  'upkeep-due': z.boolean(),
  'crew-due': z.boolean(),
});
export type NotifyPrefs = z.infer<typeof notifyPrefsSchema>;

/** What each role gets until the user chooses for themselves. */
export function defaultNotifyPrefs(role: Role): NotifyPrefs {
  return {
    'parts-ready': role === 'assembler' || role === 'lead',
    'recoat-closing': role === 'lead' || role === 'sprayer',
    'session-changed': role === 'sprayer',
    'daily-plan': role === 'lead' || role === 'sprayer',
    'upkeep-due': role === 'lead' || role === 'admin',
    'crew-due': role !== 'assembler',
  };
}

/** A user's choices, with the role's defaults for any kind added since they last chose. */
export function notifyPrefsOf(role: Role, stored: Partial<NotifyPrefs> | null | undefined): NotifyPrefs {
  return { ...defaultNotifyPrefs(role), ...(stored ?? {}) };
}

export const notificationSchema = z.object({
  id: z.number().int(),
  kind: z.enum(notificationKinds),
  subject: z.string(),
  body: z.string(),
  dueAt: z.string(),
  sentAt: z.string().nullable(),
});
export type Notification = z.infer<typeof notificationSchema>;

export const mailboxMessageSchema = z.object({ id: z.number().int(), receivedAt: z.string(), from: z.string(), to: z.string(), subject: z.string(), text: z.string() });
export type MailboxMessage = z.infer<typeof mailboxMessageSchema>;

/** The signed-in user's recent notifications (not paged: the last 50). */
export const myNotificationsSchema = z.object({ items: z.array(notificationSchema) });
export const mailboxSchema = listSchema(mailboxMessageSchema);
