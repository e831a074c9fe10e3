/**
 * The verdict as a word, an icon shape and a colour, so it reads without colour (colour-blind users, the
 * night theme): starts — a circle with an arrow; marginal — a triangle with an exclamation mark; needs assistance —
 * a square with a plus (add a locomotive).
 */
import { For, Show, type JSX } from "solid-js";
import type { Reason, Verdict } from "../../core/planner/outcome.js";
import { words as en } from "../../i18n/en/words.js";
import { tr } from "../i18n.js";
import { words } from "../words.js";
import { Figures } from "./Figures.js";

const t = tr.ns(en);

/** The verdict's shape (filled) with its mark. */
export function VerdictIcon(props: { verdict: Verdict; size?: number }): JSX.Element {
  const s = () => props.size ?? 48;
  return (
    <svg class={`verdict-icon shape-${props.verdict}`} width={s()} height={s()} viewBox="0 0 48 48" aria-hidden="true" data-shape={SHAPE[props.verdict]}>
      {props.verdict === "starts" && (
        <>
          <circle cx="24" cy="24" r="22" class="verdict-fill" />
          <path d="M12 24h21 M25 15l9 9-9 9" class="verdict-mark" />
        </>
      )}
      {props.verdict === "marginal" && (
        <>
          <path d="M24 3 46 44H2z" class="verdict-fill" />
          <path d="M24 18v12 M24 37v.01" class="verdict-mark" />
        </>
      )}
      {props.verdict === "needs-assistance" && (
        <>
          <rect x="3" y="3" width="42" height="42" rx="4" class="verdict-fill" />
          <path d="M24 12v24 M12 24h24" class="verdict-mark" />
        </>
      )}
    </svg>
  );
}

/** The icon shape per verdict (also exposed as data-shape for tests and styling). */
export const SHAPE: Record<Verdict, string> = { starts: "circle", marginal: "triangle", "needs-assistance": "square" };

export interface VerdictBannerProps {
  verdict: Verdict;
  reasons: readonly Reason[];
  /** A line under the word (e.g. the margin). */
  detail?: string;
  /** The train's own mass beside the largest masses ("This train 1,400 t · starts up to 2,063 t · …"). */
  masses?: string;
  /** The plan is for earlier inputs. */
  stale?: boolean;
  compact?: boolean;
}

export function VerdictBanner(props: VerdictBannerProps): JSX.Element {
  return (
    <section
      class={`verdict verdict-${props.verdict}`}
      classList={{ stale: props.stale === true, compact: props.compact === true }}
      aria-label={t("verdictLabel", { word: words.verdict(props.verdict) })}
      data-verdict={props.verdict}
    >
      <VerdictIcon verdict={props.verdict} size={props.compact ? 36 : 56} />
      <div class="verdict-text">
        <p class="verdict-word">{words.verdict(props.verdict)}</p>
        <Show when={!props.compact}>
          <p class="verdict-line">{words.verdictLine(props.verdict)}</p>
        </Show>
        <Show when={props.detail}>
          <p class="verdict-detail">{props.detail}</p>
        </Show>
        <Show when={props.masses}>
          <p class="verdict-masses" data-masses>
            <Figures text={props.masses!} />
          </p>
        </Show>
        <Show when={props.reasons.length > 0}>
          <p class="verdict-reasons">
            <span class="visually-hidden">{t("reasonsLabel")}</span>
            <For each={props.reasons}>{(r) => <span class="chip">{words.reason(r)}</span>}</For>
          </p>
        </Show>
        <Show when={props.stale}>
          <p class="verdict-stale">{t("verdictStale")}</p>
        </Show>
      </div>
    </section>
  );
}
