/** Which screen is shown: the location hash (#/start-plan), so reload and the back button keep it. */
import { createSignal, onCleanup, type Accessor } from "solid-js";

export interface Nav {
  screen: Accessor<string>;
  go(id: string): void;
  /** The screen shown before the current one (for leaving a full-screen view). */
  previous: Accessor<string>;
}

export function createNav(ids: readonly string[], fallback: string): Nav {
  const fromHash = () => {
    const id = location.hash.replace(/^#\/?/, "");
    return ids.includes(id) ? id : fallback;
  };
  const [screen, setScreen] = createSignal(fromHash());
  const [previous, setPrevious] = createSignal(fallback);
  const onHash = () => {
    const next = fromHash();
    if (next !== screen()) {
      setPrevious(screen());
      setScreen(next);
    }
  };
  addEventListener("hashchange", onHash);
  onCleanup(() => removeEventListener("hashchange", onHash));
  return {
    screen,
    previous,
    go: (id) => {
      if (id === screen()) return;
      setPrevious(screen());
      setScreen(id);
      if (location.hash !== `#/${id}`) location.hash = `/${id}`;
    },
  };
}
