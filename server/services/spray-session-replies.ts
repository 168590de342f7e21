import { spraySessionSchema, type SpraySession } from '../../shared/schemas/spray-session';
import type { SiteData } from '../data/site-data';
import { keyOfAnotherRecord } from './write-once';

/** The first answer to a change of this session sent with this key, or null when the key is new. */
export async function earlierReply(
  data: SiteData,
  spraySessionId: number,
  idempotencyKey: string,
): Promise<SpraySession | null> {
  const existing = await data.acrossSites.spraySessionReplies.findOneBy({ idempotencyKey });
  if (!existing) return null;
  const ours =
    existing.spraySessionId === spraySessionId && (await data.spraySessionReplies.existsBy({ id: existing.id }));
  if (!ours) throw keyOfAnotherRecord();
  return spraySessionSchema.parse(JSON.parse(existing.reply));
}

/** Kept in the change's own transaction, so the key is taken exactly when the change is made. */
export async function keepReply(tx: SiteData, idempotencyKey: string, reply: SpraySession, now: string): Promise<void> {
  await tx.spraySessionReplies.insert([
    { idempotencyKey, spraySessionId: reply.id, reply: JSON.stringify(reply), createdAt: now },
  ]);
}
