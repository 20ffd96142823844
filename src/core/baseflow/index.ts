// Filled in by the baseflow work; re-exported from src/core/index.ts.
export {};
