/**
 * The app shell: a top bar (name, screen, offline state), the screen, and a bar of large tabs generated
 * from the screen registry — a rail on the left in landscape, along the bottom in portrait. While the
 * device reports movement (and the user allowed the lock), a notice covers every control.
 */
import { createEffect, createMemo, ErrorBoundary, For, on, Show, Suspense, type JSX } from "solid-js";
import { Dynamic } from "solid-js/web";
import { Icon } from "./components/Icon.js";
import { OfflineStatus, UpdatePrompt } from "./components/OfflineStatus.js";
import { PrintStamp } from "./components/PrintStamp.js";
import { ScreenFailure, SetAsideNotice } from "./components/SetAsideNotice.js";
import { AppContext, type AppContextValue } from "./context.js";
import { show } from "./format.js";
import { shell } from "../i18n/en/shell.js";
import { tr } from "./i18n.js";
import type { ScreenEntry } from "./screens/registry.js";

const t = tr.ns(shell);

export function App(props: { state: AppContextValue; screens: readonly ScreenEntry[] }): JSX.Element {
  const s = props.state;
  const current = createMemo(() => props.screens.find((x) => x.id === s.nav.screen()) ?? props.screens[0]!);
  const full = () => current().fullScreen === true;
  return (
    <AppContext.Provider value={s}>
      <div
        class="app"
        classList={{ "full-screen": full() }}
        // While moving, nothing behind the notice can be reached, by touch, keyboard or assistive technology.
        ref={(el) => createEffect(() => el.toggleAttribute("inert", s.motion.moving()))}
        aria-hidden={s.motion.moving() ? "true" : undefined}
      >
        <Show when={!full()}>
          <header class="topbar">
            <span class="brand" aria-label="Taut">
              <svg width="32" height="32" viewBox="0 0 32 32" aria-hidden="true">
                <rect width="32" height="32" rx="7" class="brand-bg" />
                <path d="M6 11h20 M16 11v14" class="brand-mark" />
                <circle cx="6" cy="11" r="2.6" class="brand-dot" />
                <circle cx="26" cy="11" r="2.6" class="brand-dot" />
              </svg>
              <span>Taut</span>
            </span>
            <h1 class="screen-title">{current().title}</h1>
            <OfflineStatus offline={s.offline} />
          </header>
        </Show>
        <UpdatePrompt offline={s.offline} />
        <main class="screen" id="screen" data-screen={current().id}>
          <PrintStamp screen={current().title} />
          <Show when={s.draft.setAside()}>{(aside) => <SetAsideNotice aside={aside()} onDismiss={() => s.draft.dismissSetAside()} />}</Show>
          <ErrorBoundary
            fallback={(error, reset) => {
              // Going to another screen leaves the failure behind.
              createEffect(on(() => current().id, reset, { defer: true }));
              return <ScreenFailure error={error} onRetry={reset} />;
            }}
          >
            <Suspense fallback={<p class="placeholder-text">{t("loading")}</p>}>
              <Dynamic component={current().component} />
            </Suspense>
          </ErrorBoundary>
        </main>
        <Show when={!full()}>
          <nav class="tabs" aria-label={t("screensNav")}>
            <For each={props.screens.filter((x) => !x.noTab)}>
              {(x) => (
                <a
                  class="tab"
                  href={`#/${x.id}`}
                  aria-current={x.id === current().id ? "page" : undefined}
                  onClick={(e) => (e.preventDefault(), s.nav.go(x.id))}
                >
                  {typeof x.icon === "string" ? <Icon name={x.icon} size={28} /> : x.icon()}
                  {/* The tab's name is the screen's full name, read from hidden text rather than an aria-label:
                      the shown word may be shorter and carries soft hyphens (i18n tabs.ts), and a name
                      that differs from the visible text fails label-in-name (WCAG 2.1, SC 2.5.3). */}
                  <span class="tab-label" aria-hidden="true">{x.tab ?? x.title}</span>
                  <span class="visually-hidden">{x.title}</span>
                </a>
              )}
            </For>
          </nav>
        </Show>
      </div>
      <Show when={s.motion.moving()}>
        <div class="moving-notice" role="alertdialog" aria-modal="true" aria-labelledby="moving-h" aria-describedby="moving-text">
          <Icon name="moving" size={64} />
          <h2 id="moving-h">{t("movingTitle")}</h2>
          <p id="moving-text">
            {t("movingText", { speed: s.motion.speedMps() !== null ? t("movingSpeed", { speed: show("speed", s.motion.speedMps()!, s.settings.settings().units) }) : "" })}
          </p>
        </div>
      </Show>
    </AppContext.Provider>
  );
}
