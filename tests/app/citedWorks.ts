/**
 * The published works Settings cites, as they were published (authors, titles, journals): the language sweeps
 * (languageSweep, pseudoSweep) leave them as they are, since a title is not translated.
 */
export const CITED_WORKS: readonly string[] = [
  "E. W. Curtius and A. Kniffler, Elektrische Bahnen 20 (1950).",
  "S. Johnsson, IMechE (1963).",
  "W. J. Davis Jr., General Electric Review 29 (1926).",
  "Röckl",
  "W. W. Hay, Railroad Engineering, 2nd ed. (1982).",
  "W. J. White, How Diesel-Electric Locomotives Operate (1997).",
  "C. Cole, in Handbook of Railway Vehicle Dynamics (2006); Wu, Spiryagin and Cole, Vehicle System Dynamics 54 (2016).",
  // The works the rail table's notes cite (Settings/railNotes.ts).
  "Curtius–Kniffler",
  "Elektrische Bahnen 20, 1950",
  "Fisk et al., IMechE Stephenson Conference 2015",
  "Koffman 1948, J. Inst. Locomotive Engineers paper 479",
  "Olofsson et al., Proc. IMechE F 218, 2004",
];
