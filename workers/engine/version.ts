// Bump when a change alters results for the same scenario and seed.
export const ENGINE_VERSION = '2.1.1';
