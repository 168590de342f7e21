import { AuditEntryEntity } from './entities/audit-entry.entity';
import { BoothEntity } from './entities/booth.entity';
import { RackEntity } from './entities/rack.entity';
import { SessionEntity } from './entities/session.entity';
import { ShopSettingsEntity } from './entities/shop-settings.entity';
import { UserEntity } from './entities/user.entity';

export const entities = [UserEntity, SessionEntity, BoothEntity, RackEntity, AuditEntryEntity, ShopSettingsEntity];
