import type { QueryKey } from '@tanstack/react-query';
import { boothKeys } from './booths/booth-keys';
import { coatPhotoKeys } from './coat-photos/coat-photo-keys';
import { coatKeys } from './coats/coat-keys';
import { crewKeys } from './crew/crew-keys';
import { denibKeys } from './denibs/denib-keys';
import { finishSystemKeys } from './finish-systems/finish-system-keys';
import { jobKeys } from './jobs/job-keys';
import { mixKeys } from './mixes/mix-keys';
import { partKeys } from './parts/part-keys';
import { productKeys } from './products/product-keys';
import { rackKeys } from './racks/rack-keys';
import { readingKeys } from './readings/reading-keys';
import { readyKeys } from './ready/ready-keys';
import { reportKeys } from './reports/report-keys';
import { settingsKeys } from './settings/settings-keys';
import { siteKeys } from './sites/site-keys';
import { sprayerKeys } from './sprayers/sprayer-keys';
import { spraySessionKeys } from './spray-sessions/spray-session-keys';
import { todayKeys } from './today/today-keys';
import { upkeepKeys } from './upkeep/upkeep-keys';
import { userKeys } from './users/user-keys';

/**
 * What each kind of change makes out of date, as key prefixes: the resource itself and every
 * resource the server works out from it. A mutation invalidates these after it succeeds, and live
 * updates invalidate the same ones when another device makes the change, so every screen follows.
 */
export const changedKeys = {
  /** A coat (or its correction): the parts' steps and readiness, the jobs' states and ready times, the sessions' work, the day, the reports. */
  coat: (): QueryKey[] => [
    coatKeys.all,
    partKeys.all,
    readyKeys.all,
    jobKeys.all,
    spraySessionKeys.all,
    todayKeys.all,
    reportKeys.all,
  ],
  /** A photo beside a coat: the log's photos. */
  coatPhoto: (): QueryKey[] => [coatPhotoKeys.all],
  denib: (): QueryKey[] => [
    denibKeys.all,
    partKeys.all,
    readyKeys.all,
    jobKeys.all,
    spraySessionKeys.all,
    todayKeys.all,
  ],
  /** A pot: the session's mixes and the solvent and material reports. */
  mix: (): QueryKey[] => [mixKeys.all, reportKeys.all],
  /** A booking moved or run: the next coat times and job ready times count booked sessions; booth use too. */
  spraySession: (): QueryKey[] => [
    spraySessionKeys.all,
    readyKeys.all,
    jobKeys.all,
    partKeys.histories(),
    todayKeys.all,
    reportKeys.all,
  ],
  /** A part added, changed, moved or collected: its job's count, area and estimate, its rack's space. */
  part: (): QueryKey[] => [partKeys.all, readyKeys.all, jobKeys.all, spraySessionKeys.all, rackKeys.all, todayKeys.all],
  reading: (): QueryKey[] => [readingKeys.all, todayKeys.all, reportKeys.all],
  /** A job's finish system or dates: its parts' steps, the sessions' work, the day's jobs at risk. */
  job: (): QueryKey[] => [jobKeys.all, partKeys.all, readyKeys.all, spraySessionKeys.all, todayKeys.all],
  /** A data sheet: every screen that shows the product or works times out from it. */
  product: (): QueryKey[] => [
    productKeys.all,
    finishSystemKeys.all,
    jobKeys.all,
    partKeys.histories(),
    readyKeys.all,
    spraySessionKeys.all,
    todayKeys.all,
  ],
  finishSystem: (): QueryKey[] => [
    finishSystemKeys.all,
    jobKeys.all,
    partKeys.all,
    readyKeys.all,
    spraySessionKeys.all,
    todayKeys.all,
  ],
  booth: (): QueryKey[] => [boothKeys.all, siteKeys.counts(), spraySessionKeys.all, todayKeys.all],
  rack: (): QueryKey[] => [rackKeys.all, siteKeys.counts(), partKeys.all, readyKeys.all],
  /** A user: the sprayers a session may be given to, and the names sessions show. */
  user: (): QueryKey[] => [userKeys.all, siteKeys.counts(), sprayerKeys.all, spraySessionKeys.all, todayKeys.all],
  site: (): QueryKey[] => [siteKeys.all],
  /** Booth upkeep (filters, gauges, extraction and fire checks): what is due, who may spray where, the upkeep report. */
  upkeep: (): QueryKey[] => [upkeepKeys.all, spraySessionKeys.fitnesses(), reportKeys.all],
  /** A crew record (fit test, health check, training): the person, what is due, who may spray, the upkeep report. */
  crew: (): QueryKey[] => [crewKeys.all, upkeepKeys.all, spraySessionKeys.fitnesses(), reportKeys.all],
  /** The shop's timezone and planning temperature go into every time the server works out; its upkeep intervals into what is due. */
  settings: (): QueryKey[] => [
    settingsKeys.all,
    readyKeys.all,
    jobKeys.all,
    partKeys.histories(),
    todayKeys.all,
    reportKeys.all,
    upkeepKeys.all,
    spraySessionKeys.fitnesses(),
  ],
};
