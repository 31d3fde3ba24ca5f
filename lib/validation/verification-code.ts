import { z } from 'zod';

// Codes are printed in groups of four for reading aloud: WG-XXXX-XXXX-XXXX (no 0/O, 1/I).
export const verificationCodeSchema = z
  .string()
  .trim()
  .toUpperCase()
  .regex(/^WG-[2-9A-HJ-NP-Z]{4}-[2-9A-HJ-NP-Z]{4}-[2-9A-HJ-NP-Z]{4}$/, 'A report code looks like WG-7K3P-Q9XD-4MRT');
