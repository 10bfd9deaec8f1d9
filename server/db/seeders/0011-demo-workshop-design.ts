import { builtInTemplates, type TemplateStore } from "@server/templates";
import type { Database } from "../index";
import type { MigrationModule } from "../migrator";
import { demoProfileOwnerEmail, demoVises } from "./0010-demo-workshop-profiles";

export const demoDesignName = "Cam stop for the 100 mm milling vise";
const demoTemplateId = "cam-vise-stop";

/** The vise the demo design is sized from (its sizes become the template's "your vise" values). */
const vise = demoVises[0]!;

/**
 * One saved design for the demo machinist, so "Saved designs" shows what a kept configuration looks like:
 * the cam-lock vise stop sized from the workshop's 100 mm vise (invented demo sizes, see 0010), pinned
 * to the template's version at the time of seeding. Skipped when the account or the template is missing.
 */
export function demoWorkshopDesignSeeder(
  db: Database,
  templates: () => TemplateStore = builtInTemplates,
): MigrationModule {
  const { User, Design } = db.models;
  return {
    name: "0011-demo-workshop-design",
    up: async () => {
      const owner = await User.findOne({ where: { email: demoProfileOwnerEmail } });
      const compiled = templates().get(demoTemplateId);
      if (!owner || !compiled) return;
      if (await Design.findOne({ where: { ownerId: owner.id, name: demoDesignName } })) return;
      await Design.create({
        ownerId: owner.id,
        name: demoDesignName,
        notes: `Demo design of the invented Quillbrook workshop, sized from the "${vise.name}" profile. Check it in the configurator before making it.`,
        templateId: compiled.template.id,
        templateVersion: compiled.template.version,
        // The template is in millimetres, like the vise profile.
        parameters: {
          jawWidth: vise.jawWidthMm,
          jawHeight: vise.jawHeightMm,
          jawThickness: vise.jawThicknessMm,
        },
        units: "mm",
      });
    },
    down: async () => {
      const owner = await User.findOne({ where: { email: demoProfileOwnerEmail } });
      if (owner) await Design.destroy({ where: { ownerId: owner.id, name: demoDesignName } });
    },
  };
}
