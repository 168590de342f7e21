import { Foundation1764651000000 } from './migrations/1764651000000-foundation';
import { MasterData1764660000000 } from './migrations/1764660000000-master-data';
import { SessionsAndCoats1764670000000 } from './migrations/1764670000000-sessions-and-coats';
import { MixesAndChecklists1764680000000 } from './migrations/1764680000000-mixes-and-checklists';
import { Notifications1764690000000 } from './migrations/1764690000000-notifications';
import { Reports1764700000000 } from './migrations/1764700000000-reports';
import { Sites1764710000000 } from './migrations/1764710000000-sites';
import { ScaleIndexes1764712000000 } from './migrations/1764712000000-scale-indexes';
import { DenibsAndJobLifeCycle1764730000000 } from './migrations/1764730000000-denibs-and-job-life-cycle';
import { AuditSites1764740000000 } from './migrations/1764740000000-audit-sites';
import { RecordGuards1764750000000 } from './migrations/1764750000000-record-guards';
import { SessionEpoch1764750000001 } from './migrations/1764750000001-session-epoch';
import { UpkeepAndCrew1764760000000 } from './migrations/1764760000000-upkeep-and-crew';
import { ChangeIndexes1764770000000 } from './migrations/1764770000000-change-indexes';
import { ThinningRangeGiven1764780000000 } from './migrations/1764780000000-thinning-range-given';
import { ShopLocaleAndCurrency1764780000001 } from './migrations/1764780000001-shop-locale-and-currency';
import { WriteIdempotencyKeys1764790000000 } from './migrations/1764790000000-write-idempotency-keys';
import { SessionItemPartIndex1764830000000 } from './migrations/1764830000000-session-item-part-index';

/** Every committed migration, oldest first. Add new ones at the end. */
export const migrations = [Foundation1764651000000, MasterData1764660000000, SessionsAndCoats1764670000000, MixesAndChecklists1764680000000, Notifications1764690000000, Reports1764700000000, Sites1764710000000, ScaleIndexes1764712000000, DenibsAndJobLifeCycle1764730000000, AuditSites1764740000000, RecordGuards1764750000000, SessionEpoch1764750000001, UpkeepAndCrew1764760000000, ChangeIndexes1764770000000, ThinningRangeGiven1764780000000, ShopLocaleAndCurrency1764780000001, WriteIdempotencyKeys1764790000000, SessionItemPartIndex1764830000000];
