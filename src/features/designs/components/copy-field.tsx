import { useId, useRef, useState } from "react";
import { Button } from "@/components/ui/button";

/**
 * A read-only text with a Copy button. Uses the Clipboard API where the browser allows it; otherwise it
 * selects the text and says how to copy it by hand.
 */
export function CopyField({ label, value }: { label: string; value: string }) {
  const id = useId();
  const input = useRef<HTMLInputElement>(null);
  const [status, setStatus] = useState<string>("");
  async function copy() {
    try {
      if (!navigator.clipboard) throw new Error("no clipboard");
      await navigator.clipboard.writeText(value);
      setStatus("Link copied.");
    } catch {
      input.current?.select();
      setStatus("Selected: press Ctrl+C (or ⌘C) to copy.");
    }
  }
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="text-sm font-semibold text-steel-800">
        {label}
      </label>
      <div className="flex gap-2">
        <input
          id={id}
          ref={input}
          readOnly
          value={value}
          onFocus={(e) => e.target.select()}
          className="figure min-h-11 min-w-0 flex-1 rounded-md border border-steel-300 bg-steel-50 px-2 text-sm"
        />
        <Button variant="secondary" onClick={copy}>
          Copy
        </Button>
      </div>
      <p aria-live="polite" className="min-h-5 text-sm text-holds-700">
        {status}
      </p>
    </div>
  );
}
