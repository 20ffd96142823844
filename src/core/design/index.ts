// Filled in by the design work; re-exported from src/core/index.ts.
export {};
