import { useParams, useSearchParams } from "react-router";
import { useMe } from "@/features/auth/api/get-me";
import { templatesPath } from "@/features/catalogue/paths";
import { ConfiguratorPage } from "@/features/configurator/components/configurator-page";
import { SaveToDesign } from "@/features/designs/components/save-to-design";
import { savedDesignIdOf } from "@/features/designs/model/configurator-link";
import { designsPath } from "@/features/designs/paths";
import { workshopPath } from "@/features/profiles/paths";
import { LazyModelViewer } from "@/features/viewer/components/lazy-model-viewer";
import { paths } from "@/lib/paths";

/**
 * One template's configurator, with the 3D preview composed in from the viewer feature (loaded lazily)
 * and, when opened from a saved design (`saved-design=<id>`), the designs feature's "save back onto it".
 */
export function Component() {
  const { id = "" } = useParams();
  const [searchParams] = useSearchParams();
  const savedDesignId = savedDesignIdOf(searchParams);
  const me = useMe();
  return (
    <ConfiguratorPage
      key={id}
      templateId={id}
      signedIn={me.data ? true : me.isPending ? null : false}
      renderViewer={(props) => <LazyModelViewer {...props} />}
      {...(savedDesignId !== null
        ? {
            renderSaveTarget: (props) => (
              <SaveToDesign designId={savedDesignId} templateId={id} designsHref={designsPath} {...props} />
            ),
          }
        : {})}
      links={{ catalogue: templatesPath, signIn: paths.signIn, vises: workshopPath }}
    />
  );
}
