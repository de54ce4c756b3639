// Vitest runs server modules outside Next.js; 'server-only' would throw there.
export {};
