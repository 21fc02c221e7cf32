/** Name and version of the engine, stamped into every report. Bump the version when any number can change. */
export const ENGINE_NAME = 'hoopline-calc';
export const ENGINE_VERSION = '0.2.0';
