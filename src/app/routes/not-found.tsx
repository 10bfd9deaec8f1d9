import { NotFound } from "../not-found";

export function Component() {
  return <NotFound />;
}
