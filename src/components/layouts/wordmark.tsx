import { LogoMark } from "./logo-mark";

/** Mark plus name, as the header shows it. */
export function Wordmark() {
  return (
    <span className="inline-flex items-center gap-2.5">
      <LogoMark className="size-9 text-steel-200" />
      <span className="text-2xl font-bold tracking-tight text-steel-50">
        Jig<span className="text-spark-400">wright</span>
      </span>
    </span>
  );
}
