// Filled in by the events work; re-exported from src/core/index.ts.
export {};
