"use client";

import useSWR from "swr";
import type { PriceBookItem } from "@/lib/data/price-book";
import { fetcher } from "./fetcher";

export type PriceBookResponse = { items: PriceBookItem[] };

/** The one key for the whole price book, so every `mutate(priceBookKey)` refreshes the same list. */
export const priceBookKey = "/api/price-book";

/** The company's price book (active and retired items), keyed by its API path. */
export function usePriceBook(fallbackData?: PriceBookResponse) {
  return useSWR<PriceBookResponse>(priceBookKey, fetcher, { fallbackData, keepPreviousData: true });
}
