// Stands in for "server-only" under vitest.
export {};
