import type { DataSource, EntityManager, EntityTarget, ObjectLiteral } from 'typeorm';
import { AuditEntryEntity } from '../db/entities/audit-entry.entity';
import { BoothEntity } from '../db/entities/booth.entity';
import { CoatPartEntity } from '../db/entities/coat-part.entity';
import { CoatEntity } from '../db/entities/coat.entity';
import { DenibEntity, DenibPartEntity } from '../db/entities/denib.entity';
import { FinishStepEntity } from '../db/entities/finish-step.entity';
import { FinishSystemEntity } from '../db/entities/finish-system.entity';
import { JobEntity } from '../db/entities/job.entity';
import { MixEntity } from '../db/entities/mix.entity';
import { SpraySessionReplyEntity } from '../db/entities/spray-session-reply.entity';
import { NotificationEntity } from '../db/entities/notification.entity';
import { PartEntity } from '../db/entities/part.entity';
import { ProductLotEntity } from '../db/entities/product-lot.entity';
import { ProductEntity } from '../db/entities/product.entity';
import { RackEntity } from '../db/entities/rack.entity';
import { ReadingEntity } from '../db/entities/reading.entity';
import { ShopSettingsEntity } from '../db/entities/shop-settings.entity';
import { SiteEntity } from '../db/entities/site.entity';
import { SpraySessionItemEntity } from '../db/entities/spray-session-item.entity';
import { SpraySessionEntity } from '../db/entities/spray-session.entity';
import { StoredFileEntity } from '../db/entities/stored-file.entity';
import { UserEntity } from '../db/entities/user.entity';
import { CoatPhotoEntity } from '../db/entities/coat-photo.entity';
import { CrewRecordEntity } from '../db/entities/crew-record.entity';
import { ExtractionTestEntity } from '../db/entities/extraction-test.entity';
import { FilterBankEntity } from '../db/entities/filter-bank.entity';
import { FilterChangeEntity } from '../db/entities/filter-change.entity';
import { FilterGaugeReadingEntity } from '../db/entities/filter-gauge-reading.entity';
import { FireInspectionEntity } from '../db/entities/fire-inspection.entity';
import { numberedPlaceholders } from '../db/fast-read';
import { inTransaction } from '../db/transaction';
import { everySite, type SiteScope } from '../lib/site-scope';
import { ScopedRepository } from './scoped-repository';
import { byBoothOrRack, byCoat, byDenib, bySpraySession, byBooth, byUser, groupWide, ownSite, placedOnRack, siteOrGroup, type SiteRule } from './site-rules';

export type Dialect = 'sqlite' | 'postgres';

/** Raw SQL for the reports and the database's own locks. Raw SQL is not limited for you: filter with `inSite` from the scope. */
export interface RawSql {
  readonly dialect: Dialect;
  query<T = Record<string, unknown>>(text: string, params?: unknown[]): Promise<T[]>;
  /** The same with `?` placeholders on either database (numbered for PostgreSQL). */
  select<T = Record<string, unknown>>(text: string, params: unknown[]): Promise<T[]>;
  /** "One of these ids" as a sub-select on ONE bound parameter (see `idList`), so the statement's text never changes with the list. */
  readonly idList: string;
}

/** The parameter for `RawSql.idList`: a JSON array for SQLite's json_each, an int array for PostgreSQL. */
export function idListParam(dialect: Dialect, ids: readonly number[]): unknown {
  return dialect === 'postgres' ? [...ids] : JSON.stringify(ids);
}

/**
 * Every table a service may read or write, seen from one site scope (the signed-in user's, built
 * for each request by the route registry). Site-owned rows outside the scope are invisible and
 * cannot be written; group-wide rows are the same for everyone.
 */
export interface SiteData {
  readonly scope: SiteScope;
  readonly users: ScopedRepository<UserEntity>;
  readonly booths: ScopedRepository<BoothEntity>;
  readonly racks: ScopedRepository<RackEntity>;
  readonly spraySessions: ScopedRepository<SpraySessionEntity>;
  readonly spraySessionItems: ScopedRepository<SpraySessionItemEntity>;
  readonly mixes: ScopedRepository<MixEntity>;
  readonly spraySessionReplies: ScopedRepository<SpraySessionReplyEntity>;
  readonly coats: ScopedRepository<CoatEntity>;
  readonly coatParts: ScopedRepository<CoatPartEntity>;
  readonly denibs: ScopedRepository<DenibEntity>;
  readonly denibParts: ScopedRepository<DenibPartEntity>;
  readonly readings: ScopedRepository<ReadingEntity>;
  readonly audit: ScopedRepository<AuditEntryEntity>;
  readonly parts: ScopedRepository<PartEntity>;
  readonly sites: ScopedRepository<SiteEntity>;
  readonly settings: ScopedRepository<ShopSettingsEntity>;
  readonly files: ScopedRepository<StoredFileEntity>;
  readonly products: ScopedRepository<ProductEntity>;
  readonly lots: ScopedRepository<ProductLotEntity>;
  readonly finishSystems: ScopedRepository<FinishSystemEntity>;
  readonly finishSteps: ScopedRepository<FinishStepEntity>;
  readonly jobs: ScopedRepository<JobEntity>;
  readonly notifications: ScopedRepository<NotificationEntity>;
  /** Booth upkeep belongs to the booth's site; crew records to the person's; coat photos to the coat's. */
  readonly filterBanks: ScopedRepository<FilterBankEntity>;
  readonly gaugeReadings: ScopedRepository<FilterGaugeReadingEntity>;
  readonly filterChanges: ScopedRepository<FilterChangeEntity>;
  readonly extractionTests: ScopedRepository<ExtractionTestEntity>;
  readonly fireInspections: ScopedRepository<FireInspectionEntity>;
  readonly crewRecords: ScopedRepository<CrewRecordEntity>;
  readonly coatPhotos: ScopedRepository<CoatPhotoEntity>;
  readonly sql: RawSql;
  /** Runs `work` in one transaction, with the same scope. Never call it from inside `work`. */
  transaction<T>(work: (tx: SiteData) => Promise<T>): Promise<T>;
  /**
   * The same tables across every site. Only for facts that do not stop at a site (a part's whole
   * coat history decides its next step; a sprayer cannot be in two booths at once): what it reads
   * is never shown as it is.
   */
  readonly acrossSites: SiteData;
  /** The same tables limited to one site: the rules of that site's booth (its racks, its sprayers). */
  forSite(siteId: number): SiteData;
}

function build(dataSource: DataSource, manager: EntityManager, scope: SiteScope): SiteData {
  const repo = <E extends ObjectLiteral>(target: EntityTarget<E>, rule: SiteRule<NoInfer<E>>) => new ScopedRepository<E>(manager, target, rule, scope);
  const dialect: Dialect = dataSource.options.type === 'postgres' ? 'postgres' : 'sqlite';
  return {
    scope,
    users: repo(UserEntity, ownSite),
    booths: repo(BoothEntity, ownSite),
    racks: repo(RackEntity, ownSite),
    spraySessions: repo(SpraySessionEntity, byBooth),
    spraySessionItems: repo(SpraySessionItemEntity, bySpraySession),
    mixes: repo(MixEntity, bySpraySession),
    spraySessionReplies: repo(SpraySessionReplyEntity, bySpraySession),
    coats: repo(CoatEntity, bySpraySession),
    coatParts: repo(CoatPartEntity, byCoat),
    denibs: repo(DenibEntity, bySpraySession),
    denibParts: repo(DenibPartEntity, byDenib),
    readings: repo(ReadingEntity, byBoothOrRack),
    audit: repo(AuditEntryEntity, siteOrGroup),
    parts: repo(PartEntity, placedOnRack),
    sites: repo(SiteEntity, groupWide),
    settings: repo(ShopSettingsEntity, groupWide),
    files: repo(StoredFileEntity, groupWide),
    products: repo(ProductEntity, groupWide),
    lots: repo(ProductLotEntity, groupWide),
    finishSystems: repo(FinishSystemEntity, groupWide),
    finishSteps: repo(FinishStepEntity, groupWide),
    jobs: repo(JobEntity, groupWide),
    notifications: repo(NotificationEntity, groupWide),
    filterBanks: repo(FilterBankEntity, byBooth),
    gaugeReadings: repo(FilterGaugeReadingEntity, byBooth),
    filterChanges: repo(FilterChangeEntity, byBooth),
    extractionTests: repo(ExtractionTestEntity, byBooth),
    fireInspections: repo(FireInspectionEntity, byBooth),
    crewRecords: repo(CrewRecordEntity, byUser),
    coatPhotos: repo(CoatPhotoEntity, byCoat),
    sql: {
      dialect,
      query: (text, params) => manager.query(text, params),
      select: (text, params) => manager.query(dialect === 'postgres' ? numberedPlaceholders(text) : text, params),
      idList: dialect === 'postgres' ? 'SELECT unnest(CAST(? AS int[]))' : 'SELECT value FROM json_each(?)',
    },
    transaction: (work) => inTransaction(dataSource, (tx) => work(build(dataSource, tx, scope))),
    get acrossSites() {
      return build(dataSource, manager, everySite);
    },
    forSite: (siteId) => build(dataSource, manager, { siteId, homeSiteId: siteId, allSites: false }),
  };
}

/** The data a request (or the system, with `everySite`) may reach. */
export function openSiteData(dataSource: DataSource, scope: SiteScope): SiteData {
  return build(dataSource, dataSource.manager, scope);
}
