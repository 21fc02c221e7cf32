/**
 * What a jsonb column holds: an object of JSON values. Nested values are
 * typed `object` rather than recursively, which TypeORM's deep-partial
 * types cannot expand.
 */
export type JsonObject = { [key: string]: string | number | boolean | null | object };

/** A value as its JSON form (undefined fields dropped), typed for a jsonb column. */
export function toJson(value: unknown): JsonObject {
  return JSON.parse(JSON.stringify(value ?? {})) as JsonObject;
}
