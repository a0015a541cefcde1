import "server-only";
import bcrypt from "bcryptjs";

/** bcrypt (cost from PASSWORD_HASH_COST, default 12): slow on purpose, for passwords only. */
export async function hashPassword(password: string, cost = Number(process.env.PASSWORD_HASH_COST ?? 12)) {
  return bcrypt.hash(password, cost);
}

export async function verifyPassword(password: string, hash: string): Promise<boolean> {
  return bcrypt.compare(password, hash);
}

let dummyHash: Promise<string> | undefined;

/** Compared against when the e-mail is unknown, so a miss takes as long as a wrong password. */
export async function burnPasswordCheck(password: string): Promise<void> {
  dummyHash ??= hashPassword("not-a-real-password");
  await bcrypt.compare(password, await dummyHash);
}
