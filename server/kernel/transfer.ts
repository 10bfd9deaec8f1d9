/** Every distinct ArrayBuffer behind a typed array (or bare ArrayBuffer) found in a plain value. */
export function collectBuffers(value: unknown, out = new Set<ArrayBuffer>(), depth = 0): ArrayBuffer[] {
  if (depth > 12 || value === null || typeof value !== "object") return [...out];
  if (ArrayBuffer.isView(value)) {
    if (value.buffer instanceof ArrayBuffer) out.add(value.buffer);
  } else if (value instanceof ArrayBuffer) out.add(value);
  else if (Array.isArray(value)) for (const v of value) collectBuffers(v, out, depth + 1);
  else for (const v of Object.values(value)) collectBuffers(v, out, depth + 1);
  return [...out];
}
