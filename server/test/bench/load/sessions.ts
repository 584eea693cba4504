import { ACCESS_TOKEN_SECONDS } from '../../../src/auth/jwt.constants';

/**
 * Signed-in people for the run, by e-mail. Access tokens last ACCESS_TOKEN_SECONDS (15 minutes), so a long run signs
 * everyone in again two minutes before that; every request reads the current token when it is built.
 */
export class Sessions {
  private readonly tokens = new Map<string, string>();
  private timer: NodeJS.Timeout | undefined;

  constructor(
    private readonly baseUrl: string,
    private readonly password: string,
  ) {}

  async signIn(emails: readonly string[]): Promise<void> {
    for (const email of emails) this.tokens.set(email, await this.login(email));
  }

  /** The Authorization header of one signed-in person. */
  header(email: string): string {
    const token = this.tokens.get(email);
    if (!token) throw new Error(`${email} has not signed in.`);
    return `Bearer ${token}`;
  }

  keepSignedIn(onError: (error: Error) => void): void {
    const every = Math.max(60, ACCESS_TOKEN_SECONDS - 120) * 1000;
    this.timer = setInterval(() => {
      this.signIn([...this.tokens.keys()]).catch(onError);
    }, every);
  }

  stop(): void {
    clearInterval(this.timer);
  }

  private async login(email: string): Promise<string> {
    const response = await fetch(`${this.baseUrl}/api/auth/login`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email, password: this.password }),
    });
    const body = (await response.json().catch(() => ({}))) as { accessToken?: string; message?: string };
    if (!response.ok || !body.accessToken) {
      throw new Error(`Signing in as ${email} answered ${response.status}: ${body.message ?? 'no token'}`);
    }
    return body.accessToken;
  }
}
