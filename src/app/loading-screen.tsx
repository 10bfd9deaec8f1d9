import { Spinner } from "@/components/ui/spinner";

/** Shown while the first page's code arrives. */
export function LoadingScreen() {
  return (
    <div className="flex min-h-dvh items-center justify-center">
      <Spinner label="Loading Jigwright" />
    </div>
  );
}
