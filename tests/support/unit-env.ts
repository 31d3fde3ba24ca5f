// Unit tests must not depend on the running stack: the test command passes the stack's service
// settings (uploads, payments, mail) to Vitest for the integration and browser tests, and the
// services' own tests configure their SDKs themselves. Drop the stack's values here.
for (const name of Object.keys(process.env)) {
  if (name.startsWith('UPLOADTHING_') || name.startsWith('STRIPE_') || name === 'SMTP_URL') delete process.env[name];
}
