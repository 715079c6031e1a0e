import type { Region } from "@/lib/compliance";

/** The regions whose trailer-brake rules Fadeline knows, as people name them. */
export const REGION_LABELS: Record<Region, string> = {
  AU: "Australia",
  NZ: "New Zealand",
  UK: "United Kingdom",
  EU: "European Union (generic rule)",
  "US-TX": "United States: Texas",
  "US-CA": "United States: California",
  "CA-BC": "Canada: British Columbia",
  "CA-AB": "Canada: Alberta",
};
