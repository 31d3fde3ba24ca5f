// Types for the stack helpers used from TypeScript scripts (scripts/bench-app.ts).
export const root: string;
export const NEXT_DIST_DIR: string;
export const PROFILES: Record<'start' | 'test', { database: string; app: number; payments: number; uploads: number; smtp: number; mailWeb: number }>;
export const LOCAL_STRIPE_SECRET_KEY: string;
export const LOCAL_STRIPE_WEBHOOK_SECRET: string;
export const LOCAL_UPLOADTHING_API_KEY: string;
export const LOCAL_UPLOADTHING_APP_ID: string;
export function localUploadthingToken(): string;
export function checkLocalFallbacks(source?: Record<string, string | undefined>): void;
export function ensureNodeModules(): Promise<void>;
export function bringUp(mode: 'start' | 'test', options?: { resetDatabase?: boolean }): Promise<{ env: Record<string, string>; ports: Record<string, number>; group: unknown; stop: () => Promise<void>; appUrl: string }>;
export function buildApp(env: Record<string, string | undefined>): Promise<void>;
export function startApp(group: unknown, env: Record<string, string | undefined>, port: number): unknown;
