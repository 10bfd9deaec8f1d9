import type { MigrationModule } from "../migrator";
import * as m0001 from "./0001-users";
import * as m0002 from "./0002-sessions";
import * as m0003 from "./0003-user-tokens";
import * as m0010 from "./0010-vises";
import * as m0011 from "./0011-machines";
import * as m0012 from "./0012-designs";
import * as m0013 from "./0013-share-links";

/**
 * Every migration, in order, as STATIC imports (umzug's glob loader does a native import() of .ts files
 * that fails under vitest; see STACK.md). Add a new file `NNNN-what.ts` and one line here; never edit or
 * reorder a migration that has shipped.
 */
export const migrations: MigrationModule[] = [
  { name: "0001-users", ...m0001 },
  { name: "0002-sessions", ...m0002 },
  { name: "0003-user-tokens", ...m0003 },
  { name: "0010-vises", ...m0010 },
  { name: "0011-machines", ...m0011 },
  { name: "0012-designs", ...m0012 },
  { name: "0013-share-links", ...m0013 },
];
