import { Foundation1764651000000 } from './migrations/1764651000000-foundation';
import { MasterData1764660000000 } from './migrations/1764660000000-master-data';
import { SessionsAndCoats1764670000000 } from './migrations/1764670000000-sessions-and-coats';

/** Every committed migration, oldest first. Add new ones at the end. */
export const migrations = [Foundation1764651000000, MasterData1764660000000, SessionsAndCoats1764670000000];
