import argon2 from 'argon2';

// argon2id with the library's defaults (m=64 MiB, t=3, p=4): RFC 9106's second recommended option.
export const hashPassword = (password: string) => argon2.hash(password, { type: argon2.argon2id });

export async function verifyPassword(hash: string, password: string): Promise<boolean> {
  try {
    return await argon2.verify(hash, password);
  } catch {
    return false;
  }
}

// Verifying against a fixed hash when the account does not exist keeps sign-in timing even,
// so response times do not reveal which addresses have accounts.
let dummyHash: Promise<string> | undefined;
export async function burnPasswordCheck(password: string): Promise<void> {
  dummyHash ??= hashPassword('not-a-real-password-for-timing');
  await verifyPassword(await dummyHash, password);
}
