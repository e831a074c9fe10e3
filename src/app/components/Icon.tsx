/**
 * The app's own line icons (24 × 24, drawn for Taut): screens, rail conditions, actions. Decorative by
 * default: the words beside them carry the meaning.
 */
import type { JSX } from "solid-js";

const PATHS = {
  plan: "M3 20h4v-4h4v-4h4V8h4V4",
  steps: "M4 4h16v6H4z M4 14h16v6H4z M7 7h2 M7 17h2",
  settings: "M4 7h9 M17 7h3 M4 17h3 M11 17h9 M15 5v4 M9 15v4",
  assist: "M2 15h8v-5H4l-2 3z M14 15h8v-5h-6l-2 3z M10 13h4 M5 18h1 M17 18h1 M12 3v4 M10 5h4",
  departures: "M4 5h10 M4 10h10 M4 15h6 M17 13a4 4 0 1 0 .01 0z M17 15v2h2",
  notes: "M12 21s-6-5.3-6-10a6 6 0 0 1 12 0c0 4.7-6 10-6 10z M12 8.5a2.5 2.5 0 1 0 .01 0z",
  table: "M4 5h16v14H4z M4 10h16 M4 15h16 M10 5v14",
  dry: "M12 8a4 4 0 1 0 .01 0z M12 2v2.5 M12 19.5V22 M2 12h2.5 M19.5 12H22 M5 5l1.8 1.8 M17.2 17.2 19 19 M5 19l1.8-1.8 M17.2 6.8 19 5",
  damp: "M3 19h18 M7 8v.01 M12 5v.01 M17 8v.01 M9.5 12.5v.01 M14.5 12.5v.01 M7 15.5v.01 M17 15.5v.01",
  wet: "M12 3c-3.2 4.6-6 7.7-6 11a6 6 0 0 0 12 0c0-3.3-2.8-6.4-6-11z M9.5 14.5a2.5 2.5 0 0 0 2.5 2.5",
  frost: "M12 2v20 M3.3 7l17.4 10 M3.3 17l17.4-10 M9.5 3.5 12 6l2.5-2.5 M9.5 20.5 12 18l2.5 2.5",
  leaves: "M5 19C5 10 11 5 20 4c0 9-5 15-15 15z M5 19l9-9",
  greasy: "M3 8c3-2.5 6 2.5 9 0s6 2.5 9 0 M3 13c3-2.5 6 2.5 9 0s6 2.5 9 0 M3 19h18",
  sand: "M8 3h8l-2 5h-4z M12 10v.01 M10 13v.01 M14 13v.01 M8 16.5v.01 M12 16.5v.01 M16 16.5v.01 M4 21h16",
  slip: "M12 7a5 5 0 1 0 .01 0z M12 11a1 1 0 1 0 .01 0z M4 6.5A10 10 0 0 1 9 3 M20 17.5A10 10 0 0 1 15 21 M3 21h18",
  back: "M15 4l-8 8 8 8",
  next: "M9 4l8 8-8 8",
  close: "M5 5l14 14 M19 5 5 19",
  ready: "M4 14v5h16v-5 M12 3v11 M7.5 9.5 12 14l4.5-4.5",
  offline: "M4 14v5h16v-5 M3 3l18 18 M12 3v6",
  moving: "M3 12h14 M13 6l6 6-6 6",
  update: "M20 11a8 8 0 1 0-2.3 5.7 M20 4v7h-7",
  add: "M12 5v14 M5 12h14",
  remove: "M5 12h14",
  cab: "M4 4h16v16H4z M8 9h8 M12 9v8",
  clock: "M12 4a8 8 0 1 0 .01 0z M12 8v4.5l3 2",
  info: "M12 3a9 9 0 1 0 .01 0z M12 11v6 M12 7.5v.01",
  open: "M3 19V5h6l2 2h10v12z M12 16v-6 M9 12.5l3-3 3 3",
} as const;

export type IconName = keyof typeof PATHS;

export function Icon(props: { name: IconName; size?: number; label?: string; class?: string }): JSX.Element {
  return (
    <svg
      class={`icon ${props.class ?? ""}`}
      width={props.size ?? 24}
      height={props.size ?? 24}
      viewBox="0 0 24 24"
      fill="none"
      stroke="currentColor"
      stroke-width="2"
      stroke-linecap="round"
      stroke-linejoin="round"
      role={props.label ? "img" : undefined}
      aria-label={props.label}
      aria-hidden={props.label ? undefined : "true"}
     
    >
      <path d={PATHS[props.name]} />
    </svg>
  );
}
