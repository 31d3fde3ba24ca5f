import bcrypt from 'bcryptjs';

// bcrypt cost 11: about 100 ms per hash here, slow for guessing, bearable for signing in.
const COST = 11;

// Compared against when no account matches, so an unknown e-mail takes as long as a wrong password.
const DUMMY_HASH = bcrypt.hashSync('waygrade-timing-equaliser', COST);

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, COST);
}

export async function verifyPassword(password: string, hash: string | null | undefined): Promise<boolean> {
  const matches = await bcrypt.compare(password, hash ?? DUMMY_HASH);
  return Boolean(hash) && matches;
}
