// The engine's public surface. Each folder re-exports its functions from its own index.ts.
// Add one line per folder; the export snapshot test keeps changes deliberate.
export {};
