import { useCallback, useMemo, useState } from "react";
import type { CamFieldKey } from "../model/fields";
import { convertTexts, defaultTexts, parseCamTexts, type CamTexts } from "../model/parse-inputs";
import { trimNumber, unitOf, type UnitSystem } from "../model/units";
import { camFields } from "../model/fields";

interface FormState {
  system: UnitSystem;
  texts: CamTexts;
  /**
   * The texts as they stood in each system before the last switch, so switching back without editing
   * gives back exactly what was typed (no rounding drift from mm → in → mm).
   */
  before: Partial<Record<UnitSystem, CamTexts>>;
}

/**
 * The cam check's inputs as typed, the unit system, and the calculator input they make. `initial` seeds
 * the first render (the address's inputs); `load` replaces everything (an address changed from outside).
 */
export function useCamForm(initial?: { system: UnitSystem; texts: CamTexts }) {
  const [state, setState] = useState<FormState>(() => ({
    system: initial?.system ?? "mm",
    texts: initial?.texts ?? defaultTexts(initial?.system ?? "mm"),
    before: {},
  }));

  const load = useCallback((system: UnitSystem, texts: CamTexts) => {
    setState({ system, texts, before: {} });
  }, []);

  const setText = useCallback((key: CamFieldKey, text: string) => {
    setState((s) => ({ ...s, texts: { ...s.texts, [key]: text }, before: {} }));
  }, []);

  /** Puts a value given in mm/N into a field, written in the current system. */
  const setBaseValue = useCallback((key: CamFieldKey, base: number) => {
    setState((s) => {
      const field = camFields.find((f) => f.key === key);
      if (!field) return s;
      const info = unitOf(s.system, field.quantity);
      return {
        ...s,
        texts: { ...s.texts, [key]: trimNumber(base * info.fromBase, info.decimals) },
        before: {},
      };
    });
  }, []);

  const setSystem = useCallback((system: UnitSystem) => {
    setState((s) => {
      if (s.system === system) return s;
      const texts = s.before[system] ?? convertTexts(s.texts, s.system, system);
      return { system, texts, before: { [s.system]: s.texts } };
    });
  }, []);

  const reset = useCallback(
    () => setState((s) => ({ system: s.system, texts: defaultTexts(s.system), before: {} })),
    [],
  );

  const parsed = useMemo(() => parseCamTexts(state.texts, state.system), [state.texts, state.system]);
  return { system: state.system, texts: state.texts, parsed, setText, setBaseValue, setSystem, reset, load };
}
