import { trustProxySetting, validateEnvironment } from './environment';

describe('validateEnvironment', () => {
  it('fills safe local defaults', () => {
    const sut = validateEnvironment({});
    expect(sut.PORT).toBe(3000);
    expect(sut.HOST).toBe('127.0.0.1');
    expect(sut.DATABASE_URL).toMatch(/^postgres:\/\/.*127\.0\.0\.1/);
  });

  it('reads numbers from strings', () => {
    expect(validateEnvironment({ PORT: '4100', SMTP_PORT: '2600' })).toMatchObject({
      PORT: 4100,
      SMTP_PORT: 2600,
    });
  });

  it('names the variable that is wrong', () => {
    expect(() => validateEnvironment({ PORT: 'abc' })).toThrow(/PORT/);
    expect(() => validateEnvironment({ DATABASE_URL: 'mysql://x' })).toThrow(/DATABASE_URL/);
    expect(() => validateEnvironment({ JWT_SECRET: 'short' })).toThrow(/JWT_SECRET/);
  });

  it('reads TRUST_PROXY as a hop count or a list of trusted addresses', () => {
    expect(trustProxySetting(validateEnvironment({}).TRUST_PROXY)).toBe('loopback');
    expect(trustProxySetting(validateEnvironment({ TRUST_PROXY: '1' }).TRUST_PROXY)).toBe(1);
    const list = 'loopback, 10.0.0.0/8, fd00::1';
    expect(trustProxySetting(validateEnvironment({ TRUST_PROXY: list }).TRUST_PROXY)).toBe(list);
    expect(() => validateEnvironment({ TRUST_PROXY: 'true' })).toThrow(/TRUST_PROXY: "true"/);
    expect(() => validateEnvironment({ TRUST_PROXY: 'loopback,lb.internal' })).toThrow(/TRUST_PROXY: "lb.internal"/);
  });

  it('refuses the demo secret in production', () => {
    expect(() => validateEnvironment({ NODE_ENV: 'production' })).toThrow(/JWT_SECRET/);
  });
});
