/** The one formatter lives in components/format/quantity.ts; kept here under the names the editor first used. */
export * from "@/components/format/quantity";
