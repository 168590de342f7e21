import { In } from 'typeorm';
import { coatOfWords, partsWords, shopMomentWords, shopTimeWords, upperFirst, type ShopFormat } from '../../shared/words';
import type { SiteData } from '../data/site-data';
import type { CoatEntity } from '../db/entities/coat.entity';
import type { JobEntity } from '../db/entities/job.entity';
import type { PartEntity } from '../db/entities/part.entity';
import type { FinishStep } from '../../shared/finishing/readiness';

/** What an e-mail about a coat says about it: which coat, of what, sprayed where and when. */
export interface CoatStory {
  coat: CoatEntity;
  parts: PartEntity[];
  job: JobEntity | undefined;
  siteId: number | undefined;
  boothName: string;
  productName: string;
  /** The job's finish system, to say which coat of how many this was. */
  steps: FinishStep[];
}

/** "coat 2 of 3 (Kestrel 2K PU Topcoat Satin), sprayed in Booth 1 on Tue 3 Mar, 09:15". */
export function coatSentence(story: CoatStory, shop: ShopFormat): string {
  const coatSteps = story.steps.flatMap((step, index) => (step.kind === 'coat' ? [index] : []));
  const position = story.coat.stepPosition;
  const number = position === null ? -1 : coatSteps.indexOf(position);
  const which = number >= 0 ? coatOfWords(number + 1, coatSteps.length) : 'a coat';
  return `${which} (${story.productName}), sprayed in ${story.boothName} on ${shopMomentWords(new Date(story.coat.sprayedAt), shop)}`;
}

/** Booth and product names for the coats an e-mail is about. */
export async function namesFor(data: SiteData, coats: CoatEntity[], sessionBooth: Map<number, number>): Promise<{ booths: Map<number, string>; products: Map<number, string> }> {
  const boothIds = [...new Set(sessionBooth.values())];
  const productIds = [...new Set(coats.map((c) => c.productId))];
  const booths = boothIds.length ? await data.booths.findBy({ id: In(boothIds) }) : [];
  const products = productIds.length ? await data.products.findBy({ id: In(productIds) }) : [];
  return { booths: new Map(booths.map((b) => [b.id, b.name])), products: new Map(products.map((p) => [p.id, p.name])) };
}

export const partList = (parts: PartEntity[]) => parts.map((p) => `- ${p.label}`).join('\n');

/** "3 parts of LJ-26-101 (Hartfield Kitchen Co.)". */
export const partsOfJob = (count: number, job: JobEntity) => `${upperFirst(partsWords(count))} of ${job.reference} (${job.customer})`;

export const timeWords = (iso: string, shop: ShopFormat) => shopTimeWords(new Date(iso), shop);
export const momentWords = (iso: string, shop: ShopFormat) => shopMomentWords(new Date(iso), shop);
