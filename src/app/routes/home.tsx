import { useEffect } from "react";
import { useMe } from "@/features/auth/api/get-me";
import { templatesPath } from "@/features/catalogue/paths";
import { HomePage } from "@/features/home/components/home-page";

export function Component() {
  const me = useMe();
  useEffect(() => {
    document.title = "Jigwright · shop accessories sized to your machine";
  }, []);
  return <HomePage signedIn={Boolean(me.data)} cataloguePath={templatesPath} />;
}
