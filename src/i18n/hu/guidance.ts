/** Hungarian: the If wheels slip card, its headline and a helper's call (see en/guidance.ts and glossary.hu.md). */
import type { guidance } from "../en/guidance.js";
import { translation } from "../messages.js";

export const guidanceHu = translation<typeof guidance.en>()({
  driverHoldNotch: "Tartsa a fokozatot, amíg a védelem dolgozik: ne kapcsoljon fel, és egyetlen perdülés miatt ne kapcsoljon ki.",
  driverKeepSanding: "Homokoljon tovább.",
  driverSandNow: "Homokoljon most.",
  driverNoSandersEase: "Ezen a mozdonyon nincs homokoló: legyen kész hamarabb visszavenni.",
  driverDropFallback: "Ha a perdülés újra meg újra visszatér, kapcsoljon vissza a lépés tartalék fokozatára: egy alacsonyabb, tapadó fokozat gyakran jobban húz, mint egy magasabb, amely folyton perdül.",
  driverWaitSettle: "Várja meg, amíg a perdülés megszűnik és az áram beáll, mielőtt továbbkapcsol — azután fokozatonként, a tervezettnél lassabban.",
  driverNoSpin: "Álló helyzetben soha ne hagyja perdülni a kerekeket: kiégeti a sínt és a kerekeket. Kapcsoljon ki, és induljon újra.",
  driverStopSandingPoints: "Kitérők és keresztezések előtt hagyja abba a homokolást; a homok szigetelheti a vágányáramköröket.",
  protectionSandsItself: "Az erre felszerelt mozdonyokon magától homokol.",
  protectionNoSandersOnlyPower: "Ezen a mozdonyon nincs homokoló: a védelem csak a vonóerőt tudja csökkenteni.",
  protectionCutsPower: "Élesen csökkenti a vonóerőt (a gerjesztést), annál jobban, minél erősebben perdülnek a kerekek — az ampermérő esik, és a perdülő tengely lelassul a vonat sebességére.",
  protectionReapplies: "Azután gyorsan újra felépíti a vonóerőt, körülbelül ott megállva, ahol a perdülés kezdődött; a visszatérő perdülést minden alkalommal újra levágja — ilyenkor kapcsoljon vissza egy fokozatot.",
  stallGradeSecure: "Ha a vonat az emelkedőn megáll: fékezzen be a vonatfékkel és a mozdonyfékkel, és mindenekelőtt biztosítsa a vonatot.",
  stallGradeSuspectBrake: "Gyanakodjon egy nem oldott fékre a vonatban; ellenőrizze a fővezeték nyomását a vonat végén vagy a levegőáramlást.",
  stallGradeRestart: "Induljon újra az előkészítési lépéstől: tartó fokozat a mozdonyfékkel, oldja a vonatféket, adjon vonóerőt, ahogy old, oldja a mozdonyféket.",
  stallGradeNoBunching: "Emelkedőn ne tolja össze a vonatot, hogy nekifutásból induljon: a vonat vége visszagurulhat, és a vonat szétszakadhat.",
  stallAskAssistance: "Ha így sem indul, kérjen rásegítést, vagy fontolja meg a vonat megosztását, ahogy a szabályai előírják.",
  stallLevelShutOff: "Ha a vonat megáll: kapcsoljon ki, fékezzen, és hagyja az áramot leesni.",
  stallLevelSuspectBrake: "Gyanakodjon egy nem oldott fékre a vonatban.",
  stallLevelRestart: "Induljon újra az előkészítési lépéstől, és a vonatot a legalacsonyabb, még megmozdító fokozattal feszítse ki.",
  headNoPower: "Ebben a lépésben nincs vonóerő.",
  headHold: "Tartsa a(z) {notch}. fokozatot, amíg a védelem dolgozik.",
  headHoldSand: "Tartsa a(z) {notch}. fokozatot, amíg a védelem dolgozik, és homokoljon.",
  headTakePower: "Ha a kerekek a vonóerő felvételekor perdülnek, tartsa azt a fokozatot, amíg a védelem dolgozik.",
  headTakePowerSand: "Ha a kerekek a vonóerő felvételekor perdülnek, tartsa azt a fokozatot, amíg a védelem dolgozik, és homokoljon.",
  headShutOff: "Ha a(z) {notch}. fokozatban tovább perdül: kapcsoljon ki, hagyja leesni az áramot, és induljon újra.",
  headDrop: "Ha tovább perdül: vissza a(z) {notch}. fokozatra.",
});
