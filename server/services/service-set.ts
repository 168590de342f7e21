import type { SiteData } from '../data/site-data';
import type { Clock } from '../lib/clock';
import type { LiveStreamLimits } from '../lib/live-stream-limits';
import type { NotificationRuntime } from '../mail/notifications-runtime';
import { listAudit } from './audit';
import { createChangeFeed, type ChangeFeed } from './change-feed';
import { createBoothService, type BoothService } from './booths';
import { createCoatService, type CoatService } from './coats';
import { createDenibService, type DenibService } from './denibs';
import { createEstimateService, type EstimateService } from './estimates';
import type { EventBus } from './events';
import type { FileStorage } from './file-storage';
import { createFileService, type FileService } from './files';
import { createFinishSystemService, type FinishSystemService } from './finish-systems';
import { createJobService, type JobService } from './jobs';
import { createMixService, type MixService } from './mixes';
import { createNotificationReader, type NotificationReader } from './notification-reader';
import { createPartHistoryService, type PartHistoryService } from './part-history';
import { createPartImportService, type PartImportService } from './part-import';
import { createPartService, type PartService } from './parts';
import { createPlannerService, type PlannerService } from './planner';
import { createProductService, type ProductService } from './products';
import { createRackService, type RackService } from './racks';
import { createReadingService, type ReadingService } from './readings';
import { createReadyService, type ReadyService } from './ready';
import { createReportService, type ReportService } from './reports';
import { createSettingsService, type SettingsService } from './settings';
import { createSiteService, type SiteService } from './sites';
import { createSprayerService, type SprayerService } from './sprayers';
import { createSpraySessionCautionService, type SpraySessionCautionService } from './spray-session-cautions';
import { createSpraySessionService, type SpraySessionService } from './spray-sessions';
import { createTodayService, type TodayService } from './today';
import { createUserService, type UserService } from './users';
import { createCoatPhotoService, type CoatPhotoService } from './coat-photos';
import { createCrewService, type CrewService } from './crew';
import { createFitnessService, type FitnessService } from './fitness';
import { createUpkeepService, type UpkeepService } from './upkeep';
import { createUpkeepDueService, type UpkeepDueService } from './upkeep-due';

/** What services share across requests: the clock, the change feed and its open streams, the file store, the e-mail side. */
export interface ServiceDeps {
  clock: Clock;
  events: EventBus;
  liveStreams: LiveStreamLimits;
  storage: FileStorage;
  notifications?: NotificationRuntime;
}

export interface ServiceSet {
  settings: SettingsService;
  users: UserService;
  sites: SiteService;
  booths: BoothService;
  racks: RackService;
  files: FileService;
  products: ProductService;
  finishSystems: FinishSystemService;
  jobs: JobService;
  parts: PartService;
  partImport: PartImportService;
  partHistory: PartHistoryService;
  estimates: EstimateService;
  spraySessions: SpraySessionService;
  cautions: SpraySessionCautionService;
  sprayers: SprayerService;
  mixes: MixService;
  coats: CoatService;
  denibs: DenibService;
  planner: PlannerService;
  today: TodayService;
  ready: ReadyService;
  readings: ReadingService;
  reports: ReportService;
  audit: { list: (query: Parameters<typeof listAudit>[1]) => ReturnType<typeof listAudit> };
  notifications: NotificationReader;
  changes: ChangeFeed;
  upkeep: UpkeepService;
  upkeepDue: UpkeepDueService;
  crew: CrewService;
  fitness: FitnessService;
  coatPhotos: CoatPhotoService;
}

/** Each service made on first use only, then kept for the rest of the request. */
function lazily<T extends object>(makers: { [K in keyof T]: () => T[K] }): T {
  const made = {} as T;
  for (const key of Object.keys(makers) as (keyof T)[]) {
    Object.defineProperty(made, key, {
      configurable: true,
      enumerable: true,
      get: () => {
        const value = makers[key]();
        Object.defineProperty(made, key, { value, enumerable: true });
        return value;
      },
    });
  }
  return made;
}

/**
 * Every service, bound to one `SiteData` (a request's site scope, or the system's every site).
 * Adding a service: its factory takes `data` first; list it here and in `ServiceSet`.
 */
export function createServiceSet(data: SiteData, deps: ServiceDeps): ServiceSet {
  const { clock, events } = deps;
  const set: ServiceSet = lazily<ServiceSet>({
    settings: () => createSettingsService(data, clock),
    users: () => createUserService(data, events, clock),
    sites: () => createSiteService(data, clock),
    booths: () => createBoothService(data, clock),
    racks: () => createRackService(data, clock),
    files: () => createFileService(data, deps.storage, clock),
    products: () => createProductService(data, set.files, set.settings, clock, events),
    finishSystems: () => createFinishSystemService(data, clock, events),
    jobs: () => createJobService(data, clock),
    parts: () => createPartService(data, clock, events),
    partImport: () => createPartImportService(data, set.parts),
    partHistory: () => createPartHistoryService(data, set.settings, clock),
    estimates: () => createEstimateService(data, set.settings),
    spraySessions: () => createSpraySessionService(data, set.settings, events, clock),
    cautions: () => createSpraySessionCautionService(data, set.settings, clock),
    sprayers: () => createSprayerService(data),
    mixes: () => createMixService(data, clock),
    coats: () => createCoatService(data, set.settings, events, clock),
    denibs: () => createDenibService(data, events, clock),
    planner: () => createPlannerService(data, set.settings, clock),
    today: () => createTodayService(data, { settings: set.settings, planner: set.planner, sprayers: set.sprayers, upkeepDue: set.upkeepDue }, clock),
    ready: () => createReadyService(data, set.settings, clock),
    readings: () => createReadingService(data, events, clock),
    reports: () => createReportService(data, set.settings, set.estimates),
    audit: () => ({ list: (query) => listAudit(data, query) }),
    notifications: () => createNotificationReader(deps.notifications),
    changes: () => createChangeFeed(data.scope, events, deps.liveStreams),
    upkeep: () => createUpkeepService(data, set.settings, clock),
    upkeepDue: () => createUpkeepDueService(data, set.settings, clock),
    crew: () => createCrewService(data, set.settings, clock),
    fitness: () => createFitnessService(data, set.settings, clock),
    coatPhotos: () => createCoatPhotoService(data, deps.storage, clock),
  });
  return set;
}
