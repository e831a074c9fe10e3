/** Hungarian: the cautions (see en/cautions.ts and glossary.hu.md). */
import type { cautions } from "../en/cautions.js";
import { translation } from "../messages.js";

export const cautionsHu = translation<typeof cautions.en>()({
  advisory: "Csak tájékoztató. A forgalmi szabályok, a menetrend, a különleges és helyi utasítások, a mozdony kezelési utasítása és a mozdonyvezető megítélése mindig elsőbbséget élveznek. A Taut soha nem engedélyez mozgást.",
  decisions: "A rásegítésről, a vonat megosztásáról vagy a terhelés csökkentéséről azok döntenek, akiket a vasút szabályai megneveznek.",
  statistical: "A tapadás statisztikai jellegű, és minden itteni szám nagy bizonytalanságú becslés: a tartalékokat olvassa, ne egyetlen „biztonságos” számot.",
  brief: "Tervezzen és tartson eligazítást indulás előtt. A készülék használatát a vezetőállásban a helyi szabályok rendezik; menet közben semmi sem igényel bevitelt.",
  fallingGrade: "Ezen a lejtőn a vonat megindul, amint a fékjei oldanak: az indulást a fékekkel szabályozza, ne vonóerővel.",
  locoBrakeCannotHold:
    "A mozdonyfék egyedül itt nem tartja meg ezt a vonatot: lejtőn a nehéz vonatot a vonatfék tartja. A vonatféket csak ott oldja fokozatosan, ahol a fék fokozatos oldású; az egy lépésben teljesen oldó fék (közvetlen oldás) így nem oldható: kövesse az ezen a lejtőn való indításra vonatkozó helyi utasításokat.",
  sandPoints: "Ne homokoljon kitérők és keresztezések fölött; az erős homokolás elszigetelheti a vágányáramköröket. Indulás előtt ellenőrizze a homoktartályokat.",
  risingGrade: "Emelkedő: tartsa a vonatot mozdonyfékkel, alacsony fokozatban, amíg a vonatfék old; ne úgy induljon, hogy előbb összetolja a vonatot.",
  sharpCurve: "Éles ív a vonat alatt vagy előtte: a vonóerőt fokozatonként adja; egy hirtelen rántás a könnyű kocsikat leemelheti a belső sínszálról.",
  protectionActs: {
    one: "Egy lépésben a fokozat többet kér, mint amit a sín adhat: várhatóan működésbe lép a perdülésvédelem (a vonóerőt a sín adta értékre csökkenti, majd újra felépíti). Ott ismételt perdülésre számítson; tartsa a fokozatot és homokoljon, amíg a védelem dolgozik, és csak akkor kapcsoljon vissza, ha a perdülés újra meg újra visszatér.",
    other: "{count} lépésben a fokozat többet kér, mint amit a sín adhat: várhatóan működésbe lép a perdülésvédelem (a vonóerőt a sín adta értékre csökkenti, majd újra felépíti). Ott ismételt perdülésre számítson; tartsa a fokozatot és homokoljon, amíg a védelem dolgozik, és csak akkor kapcsoljon vissza, ha a perdülés újra meg újra visszatér.",
  },
  protectionStandstill: " Álló helyzetben soha ne hagyja a kerekeket perdülni: kiégeti a sínt és a kerekeket.",
  heating: "A terv legfeljebb {time} s-ig a tartós áramerősség feletti vontatóáramot tart kis sebességnél: maradjon a mozdony rövid idejű határértékein belül, és ne tartson vonóerőt álló vonaton.",
});
