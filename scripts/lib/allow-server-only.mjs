// For scripts that run server modules outside Next.js (scripts/bench-app.ts): "server-only" throws
// unless the react-server condition is set, but that condition breaks the PDF renderer's React.
// This resolves "server-only" to an empty module instead, as the unit tests do.
import { register } from 'node:module';

register(
  'data:text/javascript,' +
    encodeURIComponent(`export async function resolve(specifier, context, next) {
  if (specifier === 'server-only') return { url: 'data:text/javascript,export {}', shortCircuit: true };
  return next(specifier, context);
}`),
);
