import { Op } from "sequelize";
import type { Database } from "../index";
import type { MigrationModule } from "../migrator";
import type { MachineFields, ViseFields } from "@/shared/profiles";
import { demoAccounts } from "./demo-accounts";

/**
 * The vises and machines of the invented demo workshop (see demo-accounts.ts), given to its machinist
 * account so "my vises and machines" and the configurator's "fill from a profile" have something to show.
 * Every size and speed here is INVENTED for the demo: plausible for a small club workshop, but not
 * taken from any maker's catalogue and never to be read as a reference value.
 */
export const demoVises: readonly ViseFields[] = [
  {
    name: "Quillbrook 100 mm milling vise",
    jawWidthMm: 100,
    jawHeightMm: 32,
    jawThicknessMm: 12,
    maxOpeningMm: 100,
  },
  {
    name: "Quillbrook 125 mm milling vise",
    jawWidthMm: 125,
    jawHeightMm: 40,
    jawThicknessMm: 14,
    maxOpeningMm: 125,
  },
];

export const demoMachines: readonly MachineFields[] = [
  { name: "Small bench mill", maxSpindleRpm: 3000, units: "mm" },
  { name: "Club lathe (imperial leadscrew)", maxSpindleRpm: 2000, units: "in" },
];

/** The account that owns the demo profiles: the workshop's machinist. */
export const demoProfileOwnerEmail = demoAccounts.find((a) => a.role === "machinist")?.email ?? "";

/**
 * Runs after the demo accounts seeder. Skips when the machinist account is gone (an operator deleted it)
 * and never duplicates a profile of the same name.
 */
export function demoWorkshopProfilesSeeder(db: Database): MigrationModule {
  const { User, Vise, Machine } = db.models;
  return {
    name: "0010-demo-workshop-profiles",
    up: async () => {
      const owner = await User.findOne({ where: { email: demoProfileOwnerEmail } });
      if (!owner) return;
      for (const v of demoVises) {
        if (!(await Vise.findOne({ where: { ownerId: owner.id, name: v.name } })))
          await Vise.create({ ...v, ownerId: owner.id });
      }
      for (const m of demoMachines) {
        if (!(await Machine.findOne({ where: { ownerId: owner.id, name: m.name } })))
          await Machine.create({ ...m, ownerId: owner.id });
      }
    },
    down: async () => {
      const owner = await User.findOne({ where: { email: demoProfileOwnerEmail } });
      if (!owner) return;
      await Vise.destroy({ where: { ownerId: owner.id, name: { [Op.in]: demoVises.map((v) => v.name) } } });
      await Machine.destroy({
        where: { ownerId: owner.id, name: { [Op.in]: demoMachines.map((m) => m.name) } },
      });
    },
  };
}
