import 'server-only';
import { z } from 'zod';
import { db, type Database } from '@/db/client';
import { recordAudit } from '@/lib/audit';
import { AppError, toAppError, type ErrorCode } from '@/lib/errors';
import { can, type Permission, type Role } from '@/lib/roles';

export type Actor = { id: string; role: Role; name?: string | null; email?: string | null };
export type Transaction = Parameters<Parameters<Database['transaction']>[0]>[0];

export type OperationResult<T> =
  | { ok: true; data: T }
  | { ok: false; code: ErrorCode; message: string; fieldErrors?: Record<string, string[]> };

type Access = Permission | 'public' | 'signed-in';

type Context<I> = { actor: Actor | null; input: I; ip: string | null };

export type OperationDefinition<S extends z.ZodType, T> = {
  /** Audit action name, e.g. "machine.update". */
  name: string;
  entityType: string;
  access: Access;
  input: S;
  /** Ownership or assignment: may this actor touch this entity? Runs after the input is parsed. */
  authorize?: (ctx: Context<z.output<S>> & { actor: Actor | null }) => Promise<boolean> | boolean;
  /** The work, inside one transaction together with its audit event and any queued e-mail. */
  run: (ctx: Context<z.output<S>> & { tx: Transaction }) => Promise<{ data: T; entityId?: string | number | null; detail?: Record<string, unknown> }>;
  /** Reads need no audit row when they succeed; denials are always recorded. */
  auditSuccess?: boolean;
  /**
   * A read that needs neither a transaction nor an audit row on success (table pages, exports):
   * it runs on the database itself, which saves the BEGIN/COMMIT round trips and, with read
   * replicas configured, sends its statements to a replica. Anything read back right after a
   * write of the same request or device must not be marked so: a replica can lag.
   */
  readOnly?: boolean;
};

export type Operation<S extends z.ZodType, T> = {
  definition: OperationDefinition<S, T>;
  execute: (actor: Actor | null, raw: unknown, meta?: { ip?: string | null }) => Promise<OperationResult<T>>;
};

function fieldErrorsOf(error: z.ZodError) {
  const fieldErrors: Record<string, string[]> = {};
  for (const issue of error.issues) {
    const key = issue.path.join('.') || '_';
    (fieldErrors[key] ??= []).push(issue.message);
  }
  return fieldErrors;
}

function failure(error: AppError): OperationResult<never> {
  return { ok: false, code: error.code, message: error.message, ...(error.fieldErrors ? { fieldErrors: error.fieldErrors } : {}) };
}

async function auditRefusal(actor: Actor | null, name: string, entityType: string, outcome: 'denied' | 'invalid', ip: string | null, detail?: Record<string, unknown>) {
  try {
    await recordAudit(db, { actorId: actor?.id ?? null, actorRole: actor?.role ?? null, action: name, entityType, outcome, ipAddress: ip, detail });
  } catch {
    // An audit write that fails must not turn a refusal into a 500.
  }
}

/**
 * The one path every server action and route handler takes: session → role → input → ownership →
 * work + audit in a transaction → one result shape.
 */
export function defineOperation<S extends z.ZodType, T>(definition: OperationDefinition<S, T>): Operation<S, T> {
  return {
    definition,
    async execute(actor, raw, meta = {}) {
      const ip = meta.ip ?? null;
      const { name, entityType, access } = definition;
      if (access !== 'public' && !actor) return failure(new AppError('unauthenticated'));
      if (access !== 'public' && access !== 'signed-in' && !can(actor!.role, access)) {
        await auditRefusal(actor, name, entityType, 'denied', ip);
        return failure(new AppError('forbidden'));
      }
      const parsed = definition.input.safeParse(raw);
      if (!parsed.success) {
        await auditRefusal(actor, name, entityType, 'invalid', ip, { fields: Object.keys(fieldErrorsOf(parsed.error)) });
        return failure(new AppError('invalid_input', undefined, fieldErrorsOf(parsed.error)));
      }
      const input = parsed.data;
      try {
        if (definition.authorize && !(await definition.authorize({ actor, input, ip }))) {
          await auditRefusal(actor, name, entityType, 'denied', ip);
          // Not found rather than forbidden: do not confirm that someone else's record exists.
          return failure(new AppError('not_found'));
        }
        if (definition.readOnly) {
          // Drizzle's transaction type is the database's plus rollback, which a read never calls.
          const outcome = await definition.run({ actor, input, ip, tx: db as unknown as Transaction });
          return { ok: true, data: outcome.data };
        }
        const data = await db.transaction(async (tx) => {
          const outcome = await definition.run({ actor, input, ip, tx });
          if (definition.auditSuccess !== false) {
            await recordAudit(tx, {
              actorId: actor?.id ?? null,
              actorRole: actor?.role ?? null,
              action: name,
              entityType,
              entityId: outcome.entityId,
              detail: outcome.detail,
              ipAddress: ip,
            });
          }
          return outcome.data;
        });
        return { ok: true, data };
      } catch (error) {
        const appError = toAppError(error);
        if (appError.code === 'internal') console.error(`[${name}]`, error);
        return failure(appError);
      }
    },
  };
}
