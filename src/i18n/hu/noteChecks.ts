/** Hungarian: the Location notes editor's checks (see en/noteChecks.ts, glossary.hu.md). */
import type { noteChecks } from "../en/noteChecks.js";
import { translation } from "../messages.js";

export const noteChecksHu = translation<typeof noteChecks.en>()({
  nameMissing: "Adjon nevet a helynek: ez áll a kártya élén és a helyválasztókban.",
  noSegments: "Adjon meg legalább egy pályaszakaszt.",
  segStart: "{n}. szakasz: adja meg, hol kezdődik.",
  segLength: "{n}. szakasz: adja meg a hosszát.",
  segLengthPositive: "{n}. szakasz: a hossz nagyobb kell legyen, mint {zero}.",
  segGradient: "{n}. szakasz: adja meg a lejtviszonyt (vízszintes pályán 0).",
  segGradientSteep: "{n}. szakasz: a {grade} lejtviszony meghaladja a ±{max} értéket, meredekebb, mint amilyen tapadásos vasút épül. Ellenőrizze a számot és az előjelét.",
  segRadius: "{n}. szakasz: adja meg az ívsugarat, egyenes pályán 0-t.",
  segRadiusTight: "{n}. szakasz: a {radius} ívsugár kisebb, mint {min}. Egyenes pályán 0-t adjon meg.",
  segGap: "{gap} hézag van a(z) {k}. szakasz (vége: {end}) és a(z) {next}. szakasz (eleje: {start}) között. Használja a(z) „{join}” gombot, vagy javítsa a kezdetet.",
  segOverlap: "A(z) {next}. szakasz {overlap} hosszan átfedi a(z) {k}. szakaszt (a(z) {k}. vége: {end}, a(z) {next}. eleje: {start}). Használja a(z) „{join}” gombot, vagy javítsa a kezdetet.",
  frontMissing: "Adja meg, hol áll a vonat eleje.",
  frontBeyond: "A vonat eleje ({front}) a profil végén ({end}) túl van. Vegye fel az előtte lévő pályát, vagy vigye hátrébb a vonat elejét.",
  frontBefore: "A vonat eleje ({front}) a profil kezdete ({start}) előtt van.",
  trainNotFit:
    "A mintavonat ({length} a mozdonyokkal) nem fér el: a vége {rear} helyen állna, {short} hosszal a profil kezdete ({start}) előtt. Vegye fel a vonat mögötti pályát, vagy vigye előrébb a vonat elejét.",
  profileEnds: "A profil {ahead} távolságra ér véget a vonat eleje előtt, de {clear} szabad út van előre: vegye fel az előtte lévő pályát (addig az utolsó lejtviszony folytatódik).",
  clearMissing: "Adja meg a vonat eleje előtti szabad utat (0 vagy több).",
  speedLimit: "A sebességkorlát nagyobb kell legyen 0-nál, vagy maradjon üresen.",
  hazardNote: "{n}. veszélyes hely: írja le, mi az.",
  revisionDate: "A módosítás dátuma ÉÉÉÉ-HH-NN alakú dátum kell legyen.",
  initialsMissing: "Írja be a monogramját a módosítási bejegyzéshez.",
  initialsLong: "Monogram: legfeljebb 8 karakter.",
  changeMissing: "Írja le néhány szóban, mi változott ebben a módosításban.",
  schema: "{path}: {message}",
});
