import { useParams } from "react-router";
import { useMe } from "@/features/auth/api/get-me";
import { templatesPath } from "@/features/catalogue/paths";
import { ConfiguratorPage } from "@/features/configurator/components/configurator-page";
import { workshopPath } from "@/features/profiles/paths";
import { LazyModelViewer } from "@/features/viewer/components/lazy-model-viewer";
import { paths } from "@/lib/paths";

/** One template's configurator, with the 3D preview composed in from the viewer feature (loaded lazily). */
export function Component() {
  const { id = "" } = useParams();
  const me = useMe();
  return (
    <ConfiguratorPage
      key={id}
      templateId={id}
      signedIn={me.data ? true : me.isPending ? null : false}
      renderViewer={(props) => <LazyModelViewer {...props} />}
      links={{ catalogue: templatesPath, signIn: paths.signIn, vises: workshopPath }}
    />
  );
}
