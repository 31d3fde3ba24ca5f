// Stands in for the 'server-only' marker package when server modules run under Vitest.
export {};
