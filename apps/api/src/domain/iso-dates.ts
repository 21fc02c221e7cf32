/** A timestamp as the API answers it (ISO 8601, UTC); null stays null. */
export const iso = (d: Date | string | null | undefined): string | null =>
  d == null ? null : new Date(d).toISOString();

/** A timestamp that is always there, as the API answers it. */
export const isoRequired = (d: Date | string): string => new Date(d).toISOString();
