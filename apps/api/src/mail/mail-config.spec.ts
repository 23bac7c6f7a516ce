import { ConfigError, parseConfig } from '../config.js';

const mailOf = (env: Record<string, string>) => parseConfig(env).mail;

describe('mail settings from the environment', () => {
  it('sends to the local fake on a free port when SMTP_HOST is not set', () => {
    expect(mailOf({})).toEqual({ mode: 'fake', from: 'Tressury <no-reply@tressury.example>', fakePort: 0 });
    expect(mailOf({ SMTP_FAKE_PORT: '2525', MAIL_FROM: 'Payroll <payroll@salon.example>' })).toEqual({ mode: 'fake', from: 'Payroll <payroll@salon.example>', fakePort: 2525 });
  });

  it('switches to the real server named by SMTP_HOST, with submission port 587 and STARTTLS by default', () => {
    expect(mailOf({ SMTP_HOST: 'smtp.salon.example', MAIL_FROM: 'payroll@salon.example' })).toEqual({
      mode: 'smtp',
      from: 'payroll@salon.example',
      server: { host: 'smtp.salon.example', port: 587, secure: false, user: null, password: null },
    });
  });

  it('uses implicit TLS on port 465 unless told otherwise, and takes a user with a password', () => {
    const settings = mailOf({ SMTP_HOST: 'smtp.salon.example', SMTP_PORT: '465', SMTP_USER: 'payroll', SMTP_PASSWORD: ' s3cret ', MAIL_FROM: 'payroll@salon.example' });
    expect(settings).toMatchObject({ mode: 'smtp', server: { port: 465, secure: true, user: 'payroll', password: ' s3cret ' } });
    expect(mailOf({ SMTP_HOST: 'smtp.salon.example', SMTP_SECURE: 'true', MAIL_FROM: 'payroll@salon.example' })).toMatchObject({ server: { port: 465, secure: true } });
    expect(mailOf({ SMTP_HOST: 'smtp.salon.example', SMTP_PORT: '2525', SMTP_SECURE: 'false', MAIL_FROM: 'payroll@salon.example' })).toMatchObject({ server: { port: 2525, secure: false } });
  });

  it.each([
    [{ SMTP_HOST: 'smtp.salon.example' }, /^MAIL_FROM is required with SMTP_HOST/],
    [{ SMTP_HOST: 'smtp.salon.example', MAIL_FROM: 'not an address' }, /^MAIL_FROM must be an address/],
    [{ SMTP_HOST: 'smtp://smtp.salon.example', MAIL_FROM: 'a@salon.example' }, /^SMTP_HOST must be a host name/],
    [{ SMTP_HOST: 'smtp.salon.example', SMTP_PORT: '70000', MAIL_FROM: 'a@salon.example' }, /^SMTP_PORT must be between 1 and 65535/],
    [{ SMTP_HOST: 'smtp.salon.example', SMTP_PORT: 'submission', MAIL_FROM: 'a@salon.example' }, /^SMTP_PORT must be a whole number/],
    [{ SMTP_HOST: 'smtp.salon.example', SMTP_SECURE: 'yes', MAIL_FROM: 'a@salon.example' }, /^SMTP_SECURE must be true or false/],
    [{ SMTP_HOST: 'smtp.salon.example', SMTP_USER: 'payroll', MAIL_FROM: 'a@salon.example' }, /^SMTP_PASSWORD is required with SMTP_USER/],
    [{ SMTP_HOST: 'smtp.salon.example', SMTP_PASSWORD: 'x', MAIL_FROM: 'a@salon.example' }, /^SMTP_USER is required with SMTP_PASSWORD/],
    [{ SMTP_USER: 'payroll' }, /^SMTP_USER is set but SMTP_HOST is not/],
    [{ SMTP_FAKE_PORT: '-1' }, /^SMTP_FAKE_PORT must be a whole number/],
  ])('refuses %j naming the variable', (env, message) => {
    expect(() => mailOf(env)).toThrow(ConfigError);
    expect(() => mailOf(env)).toThrow(message);
  });
});
