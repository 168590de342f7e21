import { AuditEntryEntity } from './entities/audit-entry.entity';
import { BoothEntity } from './entities/booth.entity';
import { FinishStepEntity } from './entities/finish-step.entity';
import { FinishSystemEntity } from './entities/finish-system.entity';
import { JobEntity } from './entities/job.entity';
import { PartEntity } from './entities/part.entity';
import { ProductLotEntity } from './entities/product-lot.entity';
import { ProductEntity } from './entities/product.entity';
import { RackEntity } from './entities/rack.entity';
import { SignInSessionEntity } from './entities/sign-in-session.entity';
import { ShopSettingsEntity } from './entities/shop-settings.entity';
import { SiteEntity } from './entities/site.entity';
import { StoredFileEntity } from './entities/stored-file.entity';
import { UserEntity } from './entities/user.entity';
import { CoatPartEntity } from './entities/coat-part.entity';
import { CoatEntity } from './entities/coat.entity';
import { DenibEntity, DenibPartEntity } from './entities/denib.entity';
import { MixEntity } from './entities/mix.entity';
import { SpraySessionReplyEntity } from './entities/spray-session-reply.entity';
import { NotificationEntity } from './entities/notification.entity';
import { ReadingEntity } from './entities/reading.entity';
import { SpraySessionItemEntity } from './entities/spray-session-item.entity';
import { SpraySessionEntity } from './entities/spray-session.entity';
import { CoatPhotoEntity } from './entities/coat-photo.entity';
import { CrewRecordEntity } from './entities/crew-record.entity';
import { ExtractionTestEntity } from './entities/extraction-test.entity';
import { FilterBankEntity } from './entities/filter-bank.entity';
import { FilterChangeEntity } from './entities/filter-change.entity';
import { FilterGaugeReadingEntity } from './entities/filter-gauge-reading.entity';
import { FireInspectionEntity } from './entities/fire-inspection.entity';

export const entities = [
  UserEntity,
  SignInSessionEntity,
  BoothEntity,
  RackEntity,
  AuditEntryEntity,
  ShopSettingsEntity,
  SiteEntity,
  StoredFileEntity,
  ProductEntity,
  ProductLotEntity,
  FinishSystemEntity,
  FinishStepEntity,
  JobEntity,
  PartEntity,
  SpraySessionEntity,
  SpraySessionItemEntity,
  CoatEntity,
  CoatPartEntity,
  DenibEntity,
  DenibPartEntity,
  ReadingEntity,
  MixEntity,
  SpraySessionReplyEntity,
  NotificationEntity,
  FilterBankEntity,
  FilterGaugeReadingEntity,
  FilterChangeEntity,
  ExtractionTestEntity,
  FireInspectionEntity,
  CrewRecordEntity,
  CoatPhotoEntity,
];
