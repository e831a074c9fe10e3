/** Hungarian: each command's summary and --help (see en/cliHelp.ts and glossary.hu.md); option names stay as they are. */
import type { cliHelp } from "../en/cliHelp.js";
import { translation } from "../messages.js";

export const cliHelpHu = translation<typeof cliHelp.en>()({
  planSummary: "indítási terv egy vonatra: eredmény, ellenállás, tapadás, lépések, rásegítés",
  planHelp: `Kiszámítja, hogy a mozdonyok el tudják-e indítani a vonatot az adott helyen, és hogyan.
Ha az eredmény nem „elindul”, rásegítést is keres: egy vagy két további, a vezető mozdonnyal azonos
típusú (vagy --helper) mozdonyt a vonat elején, végén vagy közepén, mindegyik lehetőséget a tervező
dinamikájával ellenőrizve; az induló lehetőségeket a legolcsóbbal kezdve sorolja fel. Ha egyik sem
segít, megadja a vonat legnagyobb elülső részét, amely elindul (a vonat megosztása). Hogy a \`plan\` néhány
másodpercen belül maradjon, a keresés itt {budget} tervezőfutásra korlátozott a lehetőségekhez (ebből
{fullPlans} teljesen ellenőrzött) és {divide} futásra a megosztáshoz; a kiírás jelzi, ha a korlát megszakította.

Az ESET.json indítási esetfájl (taut/start-case@1); a "-" a szabványos bemenetről olvassa.

Felülírások (ami indulásról indulásra változik; az esetfájl változatlan marad):
  --rail R            sínállapot: {rails}
  --sand, --no-sand   homokolás be vagy ki
  --mass T            vontatott tömeg, tonna
  --grade EZRELÉK     lejtviszony a teljes vonat alatt, ezrelék (pozitív: előre emelkedik); a
                      pályaprofilon vagy helyszíni jegyzeten álló eset egyenletes lejtviszonnyá válik, a
                      profil legkisebb ívsugarával a vonat alatt és a szabad úttal előre

Kapcsolók:
  --json              a terv JSON-ként táblázat helyett: ugyanazok az értékek, minden mező a
                      mértékegységével megnevezve (trailingMass_t, peakCouplerForce_kN, ...), szkriptekhez
  --demo              a beépített szemléltető eset fájl helyett
  --notes FÁJL        helyszíni jegyzetek (egy taut/location@1 jegyzet vagy egy taut/notes-bundle@2
                      csomag), amelyeket az eset "location" mezője id alapján megnevezhet; többször is
  --location JEGYZET  indulás ennél a helyszíni jegyzetnél az eset saját helye helyett
  --helper ID         a rásegítési lehetőségekhez adott mozdonyprofil (alapból: a vezető mozdonyé)
  --helper-control C  a vonat közepére vagy végére adott mozdonyok vezetése: remote (saját fokozat
                      a vezető vezetőállásról; alapból) vagy helper (saját mozdonyvezető, rádión egyeztetve)
  --no-assistance     nem keres rásegítést
  --conditions        az eredmény és a tartalékok minden sínállapotra is, homokolás nélkül és vele
                      (12 további terv: néhány másodperc)`,
  checkSummary: "indulások tömeges vizsgálata: eredmény, tartalék, legnagyobb tömeg, legolcsóbb rásegítés",
  checkHelp: `Sok indulást vizsgál egyszerre: mindegyikhez egy sor az eredménnyel, az okaival, a kötő határ
tartalékával (megengedett ÷ igény), a legnagyobb vontatott tömegekkel, amelyek elindulnak és amelyek
legalább határesetek (ugyanazok az értékek, mint a \`taut plan\`-nél), és a legolcsóbb rásegítéssel,
amellyel elindul (egy vagy két további, a vezető mozdonnyal azonos típusú mozdony, vagy --helper; ha
egyik sem segít és a vonatnak rásegítés kell, legfeljebb három részre osztja).

Bemenet:
  CSV   fejléc az id,case,rail,sand oszlopokkal (és ha kell, location); a \`case\` egy indítási
        esetfájl a CSV-hez képest (a mappájában vagy alatta), a \`rail\` és a \`sand\` (yes/no)
        felülírja a feltételeit, a \`location\` (egy helyszíni jegyzet id-je) a helyét. Az üres
        cellák az eset saját értékét hagyják meg.
  JSON  indítási esetek listája ({jsonList}), mindegyik egy nem kötelező "id"-vel.
Az eset helye id alapján megnevezhet egy helyszíni jegyzetet (beépítettet vagy a --notes-ból).

Az olvashatatlan sort a sorszámával (CSV, a fejléc az 1. sor) vagy az indexével (JSON, 0-tól) jelzi;
a többi sort így is megválaszolja. Az azonos indulásokat egyszer számítja ki.

Kapcsolók:
  --sort risk   a legveszélyeztetettebbek elöl, mint az Indulások képernyőn: rásegítés kell, aztán
                határeset, aztán elindul, mindegyik tartalék szerint (a legkisebb elöl), a meg nem
                válaszolt sorok a végén; egyezésnél a fájl sorrendje. --sort file (alapból) megtartja.
  --json        a sorok JSON-ként: {json}
  --csv         a sorok CSV-ként
  --notes FÁJL  helyszíni jegyzetek (egy taut/location@1 jegyzet vagy egy taut/notes-bundle@2
                csomag); többször is megadható
  --helper ID   a rásegítési lehetőségekhez adott mozdonyprofil (alapból: minden vonat vezető mozdonyáé)
  --jobs N      munkaszálak (alapból: a rendelkezésre álló magok, itt {jobs}; 1 ezen a szálon számol)
  --shard K/N   csak a fájl minden N-edik indulását válaszolja meg, a K-adiktól (K = 1…N): egy
                ütemező N feladata így osztja szét a napot gépek között; a CSV-kimeneteket utána
                össze kell fűzni (README: Splitting a day among machines)
  --quiet       nincsenek haladási sorok a stderr-en
  --allow-outside
                a CSV mappáján kívüli esetfájlokat is olvassa (alapból csak azt a mappát és az alatta
                lévőket)

Minden indulás rásegítés-keresése {budget} tervezőfutásra korlátozott a lehetőségekhez és {divide} futásra a
vonat megosztásához; az esetre futtatott \`taut plan\` minden induló lehetőséget felsorol.

Kilépési kódok: 0, ha minden sor megválaszolt; 2, ha egyes sorok hibás bemenetek voltak (felsorolja
őket, a többit így is megválaszolja) vagy maga a fájl olvashatatlan; 1, ha egy sornál a számítás hibára
futott.`,
  tableSummary: "egy hely terhelési táblázata: a legnagyobb induló tömeg sínállapotonként, homokolás nélkül és vele",
  tableHelp: `A legnagyobb vontatott tömeg, amelyet a mozdonyok egy helyen elindítanak, minden sínállapotra,
homokolás nélkül és vele. Minden érték intervallumfelezés az indítási tervező eredménye fölött (a
statikus határ alatt): a nála kicsit könnyebb vonat elindul, a kicsit nehezebb nem. Tizenkét
tömegkeresés párhuzamos munkaszálakon: néhány másodperc.

A HELYSZÍN.json helyszíni jegyzet (taut/location@1), vagy csomag (taut/notes-bundle@2) a --note ID-vel;
beépített jegyzet fájl helyett az id-jével is megnevezhető.

A vonat, amelyre a táblázat szól: a jegyzet mintavonata — ugyanaz, amelyet az alkalmazás Helyszíni
jegyzetek kártyája használ —, vagy ha a jegyzet nem nevez meg ilyet, az első vonatsablon
({firstTrain}); a --loco és a --count a mozdonyait cseréli. Bármely vonatkapcsoló (--wagons,
--wagon-type, --slack, --limit) helyette --wagons darab --wagon-type kocsiból álló vonatot ad
(alapból {wagons} × {wagonType}) görgős csapágyakkal.

Kapcsolók:
  --note ID          a csomag melyik jegyzete
  --loco ID          mozdonyprofil a vonat elején (alapból: a mintavonaté; vonatkapcsolókkal kötelező)
  --count N          hány darab (alapból: a mintavonaté, vagy 1)
  --wagons N         kocsik száma a vonatban (alapból {wagons})
  --wagon-type ID    kocsitípus (alapból {wagonType})
  --slack MM         szabad hézag kapcsolásonként (alapból: a kocsitípusé)
  --limit KN         a vonókészülék üzemi határa, 100–5000 (alapból 970 kN önműködő kapcsolókészülék,
                     850 kN csavarkapocs)
  --temperature C    léghőmérséklet (alapból {temperature} °C, vagy a mintavonaté)
  --target-kmh V     a sebesség, amelyet az indulásnak el kell érnie (alapból {target} km/h, legfeljebb
                     a jegyzet sebességkorlátja)
  --jobs N           munkaszálak (alapból: a rendelkezésre álló magok; 1 ezen a szálon számol)
  --quiet            nincsenek haladási sorok a stderr-en
  --json | --csv     géppel olvasható kimenet`,
  simulateSummary: "egy megadott fokozatsorrend futtatása a vonatdinamikai modellen",
  simulateHelp: `Lefuttatja a megadott fokozatokat (fokozat@másodperc), és kiírja, mikor mozdul meg az utolsó jármű,
a vonókészülék-erőket a vonat mentén, a hézagzáródás sebességeit, a perdüléseket, a végsebességet és
a megtett utat. Ha a kerekek perdülnek, a kiírás FIGYELEM-mel kezdődik (a JSON-ban \`warnings\`):
próbáljon kisebb fokozatokat vagy későbbi lépéseket.
A fékek úgy oldanak, ahogy a terv oldja őket: a vonatfék oldása 0 s-kor kezdődik és hátrafelé halad
(olyan lejtőn, amelyet a mozdonyfék nem tud megtartani, fokozatosan); a mozdonyfék a --release-at
pillanatáig tart (alapból: a terv pillanata, és legalább 3 s-mal az első fokozat után).
--duration nélkül a futás addig tart, amíg el nem éri az eset célját, és megmondja, mi állította meg
előbb: az időkorlát ({cap} s), elakadás, vagy álló helyzetben perdülő kerekek.

Kapcsolók:
  --sequence S           fokozat@másodperc, vesszővel elválasztva (kötelező)
  --duration S           pontosan S másodpercet számol
  --release-at S         mikor oldják a mozdonyféket, s
  --brake-released       a vonatfék 0 s-kor már oldva van (a mozdonyfék ekkor az első fokozat után
                         3 s-ig tart, hacsak a --release-at mást nem mond)
  --adhesion-quantile Q  a futás feltételezett tapadása: 0.5 medián (alapból), 0.1 a legrosszabb 10 %
  --json                 JSON-kimenet
  --series               a --json mellett a ritkított idősor is`,
  reviewSummary: "egy rögzített indulás (GPX vagy CSV) összevetése a tervvel, és a megfigyelt tényezők illesztése",
  reviewHelp: `Az eset tervére fektet egy rögzített indulást az indulás pillanatától (amikor a sebesség először
5 s-ig 2 km/h fölött marad), és a dinamikai modell újrafuttatásával illeszti a vontatott tömeg azon
tényezőjét, amely visszaadja („úgy viselkedett, mintha 12 %-kal nehezebb lett volna”), 95 %-os
intervallummal. Rögzített fokozattal a mozdonyok vonóerejét is illeszti, és jelzi, ha a felvétel nem
tudja a kettőt szétválasztani; fokozattal és árammal a perdüléseket is megtalálja (az áram esik, míg a
fokozat marad). Ezután az illesztett értékekkel újratervez: változna-e az eredmény?

FELVÉTEL: GPX 1.1 nyomvonal (idő és helyzet; a sebesség a helyzetekből, vagy a pontokkal rögzített
sebesség) vagy CSV-napló a time_s,speed_kmh[,notch][,current_A][,distance_m] fejléccel.

Kapcsolók:
  --json     JSON-kimenet (az illesztett tényezők a massFactor és az effortFactor, mindegyik low és
             high értékkel)
  --series   a --json mellett a terv, a felvétel és az illesztett futás is, másodpercenként`,
  notesSummary: "helyszíni jegyzetek más fájlokból: from-railml (egy railML 2.x vonal szakasza)",
  notesHelp: `from-railml: helyszíni jegyzet egy railML 2.2–2.5 infrastruktúra-fájlból. A vágányok gradientChanges és
radiusChanges elemeit a trackBegin / trackEnd kapcsolataikon át követi az álló vonat eleje mögött
--behind méteren és előtte --ahead méteren, és egymás után fűzi: 0 szelvény a szakasz hátsó végén, a
menetirányban emelkedő lejtviszony pozitív, ívsugár 0 az egyenesre.
A vonatra érvényes jelzők, kitérők, útátjárók, alagutak, hidak és peronszélek a szakaszban a jegyzet
veszélyforrásai lesznek; a vonat eleje előtti legkisebb vMax a sebességkorlátja.

Kapcsolók:
  --at POS           hol áll a vonat eleje: vonalbeli helyzet méterben (railML absPos), pos a --track
                     kapcsolóval megadott vágányon, vagy egy szolgálati hely neve, id-je vagy kódja
  --direction D      up: a vonat eleje alatti vágány növekvő pos-a felé (railML dir="up"); down: a másik irány
  --behind M         a vonal méterei a vonat eleje mögött (alapból {behind}; legalább a vonat hossza)
  --ahead M          a vonal méterei a vonat eleje előtt (alapból {ahead}); a jegyzet szabad útja
  --track ID         a vágány, amelyen a vonat eleje áll (kell, ahol egy vonalbeli helyzet több
                     vágányra esik)
  --name SZÖVEG      a jegyzet neve (alapból: a szolgálati hely, vagy a vágány és a helyzet)
  --id ID            a jegyzet id-je (alapból: a névből képezve)
  --initials XX      monogram a jegyzet első változásbejegyzéséhez (alapból: railML)
  --no-hazards       a veszélyforrások elhagyása
  --out FÁJL         a jegyzet kiírása a FÁJL-ba
  --json             a jegyzet (taut/location@1) kiírása a szabványos kimenetre

A railML 3 fájlokat felismeri és elutasítja. Az XML-entitásdeklarációkat elutasítja, sosem bontja ki.`,
  langOption: "a szöveg nyelve: en angol, hu magyar, de német (alapból: az LC_ALL, az LC_MESSAGES vagy a LANG szerint); a JSON és a CSV minden nyelven ugyanaz",
  metaFile: "FÁJL",
  metaCase: "ESET",
  metaDepartures: "INDULÁSOK",
  metaLocation: "HELYSZÍN",
  metaRecording: "FELVÉTEL",
  metaText: "SZÖVEG",
  metaPermille: "EZRELÉK",
  metaNoteId: "JEGYZET",
});
