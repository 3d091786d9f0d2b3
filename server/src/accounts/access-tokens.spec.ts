import jwt from 'jsonwebtoken';
import { AccessTokens } from './access-tokens';

const config = {
  jwtSecret: 'a-test-secret-of-some-length-0123456789',
  issuer: 'tumblewise',
  audience: 'tumblewise-api',
  accessTokenSeconds: 1,
  refreshTokenDays: 1,
  passwordResetMinutes: 1,
  invitationDays: 1,
  bcryptCost: 4,
  cookieSecure: false,
};
const claims = { userId: '6a3e2d1c-0000-4000-8000-000000000001', sessionId: '6a3e2d1c-0000-4000-8000-000000000002' };

describe('access tokens', () => {
  it('verifies its own token, again and again, to the same claims', () => {
    const tokens = new AccessTokens(config);
    const token = tokens.sign(claims);
    expect(tokens.verify(token)).toEqual(claims);
    expect(tokens.verify(token)).toEqual(claims);
  });

  it('refuses a token whose signature was changed, even after the genuine one was verified', () => {
    const tokens = new AccessTokens(config);
    const token = tokens.sign(claims);
    tokens.verify(token);
    const [head, body, signature] = token.split('.');
    const forged = `${head}.${body}.${signature.startsWith('A') ? 'B' : 'A'}${signature.slice(1)}`;
    expect(() => tokens.verify(forged)).toThrow(expect.objectContaining({ status: 401, code: 'token_invalid' }));
    const otherKey = jwt.sign({ sid: claims.sessionId }, 'another-secret', {
      algorithm: 'HS256',
      subject: claims.userId,
      issuer: 'tumblewise',
      audience: 'tumblewise-api',
      expiresIn: 60,
    });
    expect(() => tokens.verify(otherKey)).toThrow(expect.objectContaining({ code: 'token_invalid' }));
  });

  it('answers "expired" for a remembered token once its lifetime is over', async () => {
    const tokens = new AccessTokens(config);
    const token = tokens.sign(claims);
    expect(tokens.verify(token)).toEqual(claims);
    const { exp } = jwt.decode(token) as { exp: number };
    await new Promise((r) => setTimeout(r, Math.max(0, exp * 1000 - Date.now()) + 50));
    expect(() => tokens.verify(token)).toThrow(expect.objectContaining({ status: 401, code: 'token_expired' }));
  });
});
