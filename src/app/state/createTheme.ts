/** The theme in effect: day or night, from the setting or from the system's preference; set on <html>. */
import { createEffect, createSignal, onCleanup, type Accessor } from "solid-js";
import type { ThemeChoice } from "./createSettings.js";

export type Theme = "day" | "night";

/** Page colour per theme, for the browser's own chrome (meta theme-color). */
export const THEME_COLOUR: Record<Theme, string> = { day: "#eef1f4", night: "#0d1013" };

export function createTheme(choice: Accessor<ThemeChoice>, root: HTMLElement = document.documentElement): Accessor<Theme> {
  const mq = typeof matchMedia === "function" ? matchMedia("(prefers-color-scheme: dark)") : null;
  const [systemDark, setSystemDark] = createSignal(mq?.matches ?? false);
  const onChange = (e: MediaQueryListEvent) => setSystemDark(e.matches);
  mq?.addEventListener("change", onChange);
  onCleanup(() => mq?.removeEventListener("change", onChange));
  const theme = (): Theme => {
    const c = choice();
    return c === "system" ? (systemDark() ? "night" : "day") : c;
  };
  createEffect(() => {
    const t = theme();
    root.dataset.theme = t;
    root.style.colorScheme = t === "night" ? "dark" : "light";
    document.querySelector('meta[name="theme-color"]')?.setAttribute("content", THEME_COLOUR[t]);
  });
  return theme;
}
