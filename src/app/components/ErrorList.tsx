/** Every rule the inputs break, each naming its field, away from the fields (a summary at the top). */
import { For, Show, type JSX } from "solid-js";
import type { FieldIssue } from "../../profiles/issues.js";
import { issueLine } from "../fields.js";
import { shell } from "../../i18n/en/shell.js";
import { tr } from "../i18n.js";

const t = tr.ns(shell);

export function ErrorList(props: { issues: readonly FieldIssue[]; title?: string }): JSX.Element {
  return (
    <Show when={props.issues.length > 0}>
      <section class="error-list" aria-live="polite">
        <h3>{props.title ?? t("fixInputs", { count: props.issues.length })}</h3>
        <ul>
          <For each={props.issues}>{(i) => <li>{issueLine(i)}</li>}</For>
        </ul>
      </section>
    </Show>
  );
}
