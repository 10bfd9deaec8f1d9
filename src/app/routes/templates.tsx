import { CataloguePage } from "@/features/catalogue/components/catalogue-page";
import { configuratorPathOf } from "@/features/catalogue/paths";
import { PartPicture } from "@/features/viewer/components/part-picture";
import { paths } from "@/lib/paths";

/** The catalogue, with card pictures drawn by the viewer feature (its three.js code loads on first use). */
export function Component() {
  return (
    <CataloguePage
      renderPicture={(t) => <PartPicture templateId={t.id} templateName={t.name} />}
      templateHref={configuratorPathOf}
      camCheckHref={paths.camCheck}
    />
  );
}
