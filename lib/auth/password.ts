import bcrypt from "bcryptjs";

const COST = 11;

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, COST);
}

export function verifyPassword(password: string, hash: string): Promise<boolean> {
  return bcrypt.compare(password, hash);
}

// Compared against when no account exists, so that a wrong e-mail takes as long as a wrong password.
export const DUMMY_HASH = bcrypt.hashSync("not-a-real-password-hangarline", COST);
