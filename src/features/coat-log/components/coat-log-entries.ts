import type { Coat } from '../../../../shared/schemas/coat';
import type { Denib } from '../../../../shared/schemas/denib';
import { denibWords, partsWords, shopMomentWords, upperFirst, type ShopFormat } from '../../../../shared/words';

type LogEntry = { kind: 'coat'; at: string; coat: Coat } | { kind: 'denib'; at: string; denib: Denib };

/** Coats and the denibs between them, newest first, as the log lists them. */
export function logEntries(coats: Coat[], denibs: Denib[]): LogEntry[] {
  const entries: LogEntry[] = [...coats.map((coat) => ({ kind: 'coat' as const, at: coat.sprayedAt, coat })), ...denibs.map((denib) => ({ kind: 'denib' as const, at: denib.abradedAt, denib }))];
  // Stable for equal times: a denib recorded at the same minute as a coat lists after it (it came first).
  return entries.sort((a, b) => Date.parse(b.at) - Date.parse(a.at));
}

export const denibEntryWords = (denib: Denib) => `${upperFirst(denibWords(denib.grit))} · ${partsWords(denib.partIds.length)}`;

/** A denib row as people name it: "Denib with P320, 2 parts, Tue 3 Mar, 10:40". */
export const denibRowWords = (denib: Denib, shop: ShopFormat) => `${upperFirst(denibWords(denib.grit))}, ${partsWords(denib.partIds.length)}, ${shopMomentWords(new Date(denib.abradedAt), shop)}`;
