/**
 * Runs async jobs one after another. A job whose signal aborts while it waits is dropped without running,
 * so a catalogue the person has already left (or filtered) does not keep the server's solid modeller busy
 * drawing pictures nobody will see. Side effect: module-level queue, shared by every caller.
 */
export function createSerialQueue() {
  let tail: Promise<unknown> = Promise.resolve();
  return function run<T>(job: () => Promise<T>, signal?: AbortSignal): Promise<T> {
    const result = tail.then(() => {
      if (signal?.aborted) throw new DOMException("The picture is no longer needed.", "AbortError");
      return job();
    });
    tail = result.catch(() => undefined);
    return result;
  };
}
