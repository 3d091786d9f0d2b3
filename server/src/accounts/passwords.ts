import bcrypt from 'bcryptjs';

/** bcrypt hashes with the configured cost. */
export class Passwords {
  private readonly dummyHash: string;

  constructor(private readonly cost: number) {
    this.dummyHash = bcrypt.hashSync('not-a-real-password-0', cost);
  }

  hash(password: string): Promise<string> {
    return bcrypt.hash(password, this.cost);
  }

  /** Compares against a throwaway hash when there is no user, so timing does not tell. */
  matches(password: string, hash: string | null): Promise<boolean> {
    return bcrypt.compare(password, hash ?? this.dummyHash).then((ok) => ok && hash !== null);
  }
}
