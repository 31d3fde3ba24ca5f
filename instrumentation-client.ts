// Runs in the browser before the app hydrates. zod 4 probes whether it may compile validators with
// `new Function`; the content security policy forbids eval, so the probe is reported as a
// violation on every page with a form. Tell zod to validate without compiling. zod keeps its
// settings on this global so every copy shares them; setting it here, without importing zod,
// keeps zod out of pages that have no form.
const holder = globalThis as { __zod_globalConfig?: { jitless?: boolean } };
(holder.__zod_globalConfig ??= {}).jitless = true;
