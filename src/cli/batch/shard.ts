/**
 * `--shard K/N`: the share of a day's departures one job of a batch scheduler's job array answers — every
 * N-th departure of the file, starting with the K-th (K from 1 to N). The N shards together hold every
 * departure once, whatever N, so N jobs with K = 1…N split a network's day among machines with no
 * coordination between them; their CSV outputs are joined afterwards (README).
 */
import { errorWords, InputError } from "../errors.js";

export interface Shard {
  /** This job's share, 1…n. */
  k: number;
  /** How many shares the day is split into. */
  n: number;
}

/** Largest N accepted: more shares than that would be mostly empty. */
export const MAX_SHARDS = 10_000;

/** Read "K/N"; throws InputError naming the rule broken. */
export function parseShard(text: string): Shard {
  const m = /^\s*(\d+)\s*\/\s*(\d+)\s*$/.exec(text);
  const k = m ? Number(m[1]) : NaN;
  const n = m ? Number(m[2]) : NaN;
  if (!m || n < 1 || n > MAX_SHARDS || k < 1 || k > n) {
    throw new InputError(errorWords()("shardValue", { max: String(MAX_SHARDS), value: `"${text}"` }));
  }
  return { k, n };
}

/** The items of shard K/N: positions K−1, K−1+N, K−1+2N, … (0-based) of the list, in order. */
export function shardOf<T>(items: readonly T[], shard: Shard): T[] {
  return items.filter((_, p) => p % shard.n === shard.k - 1);
}
