/**
 * The line a printed screen carries (print only; hidden on screen): the program version, the screen, when
 * it was printed and a fingerprint of the inputs its figures come from; and, when the screen was printed
 * before its figures were worked out, a clear "incomplete" line instead of a silent gap. The time is taken
 * just before each print (`beforeprint`). A location card prints its own, fuller stamp.
 */
import { createSignal, onCleanup, Show, type JSX } from "solid-js";
import { fingerprint } from "../../profiles/fingerprint.js";
import { printStamp, printStatus } from "../state/printStatus.js";
import { APP_VERSION } from "../version.js";
import { shell } from "../../i18n/en/shell.js";
import { tr } from "../i18n.js";

const t = tr.ns(shell);

export function PrintStamp(props: { screen: string }): JSX.Element {
  const [at, setAt] = createSignal(printStamp());
  const before = () => setAt(printStamp());
  window.addEventListener("beforeprint", before);
  onCleanup(() => window.removeEventListener("beforeprint", before));
  const status = printStatus;
  return (
    <div class="print-stamp" aria-hidden="true">
      <Show when={status() && !status()!.complete}>
        <p class="print-incomplete">
          <strong>{t("printIncomplete", { what: status()!.waitingFor })}</strong>
          {t("printIncompleteText")}
        </p>
      </Show>
      <p>
        {t("printStamp", { version: APP_VERSION, screen: props.screen, at: at() })}
        {/* Words in a JSX expression, not a Show callback's return: they redraw when the language changes. */}
        <Show when={status()}>{t("printFingerprint", { fingerprint: fingerprint([APP_VERSION, status()!.inputs]) })}</Show>
        {t("printAdvisory")}
      </p>
    </div>
  );
}
