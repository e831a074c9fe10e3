/**
 * The app's settings: language, units, theme, the two safety settings that go into every case, and whether the
 * moving lock may use the device's location. Kept in localStorage; a missing or damaged entry falls
 * back to the defaults field by field.
 */
import { createSignal, type Accessor } from "solid-js";
import { DEFAULT_SETTINGS } from "../../core/train/types.js";
import type { UnitSystem } from "../format.js";
import { isLanguageChoice, type LanguageChoice } from "../i18n.js";

export type ThemeChoice = "day" | "night" | "system";

export interface AppSettings {
  units: UnitSystem;
  theme: ThemeChoice;
  /** Peak coupler force must stay ≤ working limit ÷ this (1..3). */
  couplerSafetyFactor: number;
  /** Highest acceptable slip risk of the effort a start needs, 0..0.5. */
  slipRiskThreshold: number;
  /** Highest slip risk of the needed effort that is still "marginal" rather than "needs assistance", 0..0.5. */
  marginalSlipRisk: number;
  /** Hide the controls while the device reports movement (uses Geolocation). */
  motionLock: boolean;
  /** The language on screen: one of ours, or "auto" (the device's preferred languages). */
  language: LanguageChoice;
}

export const DEFAULT_APP_SETTINGS: AppSettings = {
  units: "metric",
  theme: "system",
  couplerSafetyFactor: DEFAULT_SETTINGS.couplerSafetyFactor,
  slipRiskThreshold: DEFAULT_SETTINGS.slipRiskThreshold,
  marginalSlipRisk: DEFAULT_SETTINGS.marginalSlipRisk,
  motionLock: false,
  language: "auto",
};

export const SETTINGS_KEY = "taut.settings.v1";

/** Bounds the case schema accepts (INTERFACE.md settings). */
export const SAFETY_BOUNDS = {
  couplerSafetyFactor: { min: 1, max: 3, step: 0.05 },
  slipRiskThreshold: { min: 0.01, max: 0.5, step: 0.01 },
  marginalSlipRisk: { min: 0.01, max: 0.5, step: 0.01 },
} as const;

/** Read settings from storage, keeping only values of the right kind and range. */
export function readSettings(raw: string | null): AppSettings {
  const out = { ...DEFAULT_APP_SETTINGS };
  if (!raw) return out;
  let o: Record<string, unknown>;
  try {
    const parsed: unknown = JSON.parse(raw);
    if (!parsed || typeof parsed !== "object") return out;
    o = parsed as Record<string, unknown>;
  } catch {
    return out;
  }
  if (o.units === "metric" || o.units === "us") out.units = o.units;
  if (o.theme === "day" || o.theme === "night" || o.theme === "system") out.theme = o.theme;
  const f = o.couplerSafetyFactor;
  if (typeof f === "number" && f >= SAFETY_BOUNDS.couplerSafetyFactor.min && f <= SAFETY_BOUNDS.couplerSafetyFactor.max) out.couplerSafetyFactor = f;
  const t = o.slipRiskThreshold;
  if (typeof t === "number" && t >= SAFETY_BOUNDS.slipRiskThreshold.min && t <= SAFETY_BOUNDS.slipRiskThreshold.max) out.slipRiskThreshold = t;
  const b = o.marginalSlipRisk;
  if (typeof b === "number" && b >= SAFETY_BOUNDS.marginalSlipRisk.min && b <= SAFETY_BOUNDS.marginalSlipRisk.max) out.marginalSlipRisk = b;
  if (typeof o.motionLock === "boolean") out.motionLock = o.motionLock;
  if (isLanguageChoice(o.language)) out.language = o.language;
  return out;
}

export interface SettingsStore {
  settings: Accessor<AppSettings>;
  update(patch: Partial<AppSettings>): void;
  resetSafety(): void;
}

/** Settings kept in `storage` (localStorage in the app; null keeps them in memory only). */
export function createSettings(storage: Storage | null = safeLocalStorage()): SettingsStore {
  const [settings, setSettings] = createSignal<AppSettings>(readSettings(read(storage, SETTINGS_KEY)));
  const update = (patch: Partial<AppSettings>) => {
    const next = { ...settings(), ...patch };
    setSettings(next);
    write(storage, SETTINGS_KEY, JSON.stringify(next));
  };
  return {
    settings,
    update,
    resetSafety: () =>
      update({
        couplerSafetyFactor: DEFAULT_APP_SETTINGS.couplerSafetyFactor,
        slipRiskThreshold: DEFAULT_APP_SETTINGS.slipRiskThreshold,
        marginalSlipRisk: DEFAULT_APP_SETTINGS.marginalSlipRisk,
      }),
  };
}

/** localStorage, or null where the browser refuses it (private modes, policies). */
export function safeLocalStorage(): Storage | null {
  try {
    return typeof localStorage === "undefined" ? null : localStorage;
  } catch {
    return null;
  }
}

export function read(storage: Storage | null, key: string): string | null {
  try {
    return storage?.getItem(key) ?? null;
  } catch {
    return null;
  }
}

export function write(storage: Storage | null, key: string, value: string): void {
  try {
    storage?.setItem(key, value);
  } catch {
    // Storage full or refused: the setting still applies for this session.
  }
}
