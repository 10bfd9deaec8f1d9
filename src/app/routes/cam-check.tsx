import { CamCheckPage } from "@/features/cam-check/components/cam-check-page";

export function Component() {
  return <CamCheckPage />;
}
