/** autocannon ships no types; bench/load-runner.ts uses only its callback form. */
declare module "autocannon" {
  function autocannon(options: Record<string, unknown>, callback: (err: unknown, result: never) => void): unknown;
  export default autocannon;
}
