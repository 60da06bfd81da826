/** Environment configuration: our own variables first, the platform's PORT and HOST as fallbacks. */
import { describe, expect, it } from 'vitest';
import { loadConfig } from '../../src/api/config.js';

describe('listening address', () => {
  it('defaults to 0.0.0.0:8080', () => {
    const config = loadConfig({});
    expect([config.host, config.port]).toEqual(['0.0.0.0', 8080]);
  });
  it('honours PORT and HOST when OILSKIN_PORT and OILSKIN_HOST are unset (container platforms set them)', () => {
    const config = loadConfig({ PORT: '3000', HOST: '127.0.0.1' });
    expect([config.host, config.port]).toEqual(['127.0.0.1', 3000]);
  });
  it('prefers OILSKIN_PORT and OILSKIN_HOST over PORT and HOST', () => {
    const config = loadConfig({ PORT: '3000', HOST: '127.0.0.1', OILSKIN_PORT: '9090', OILSKIN_HOST: '::1' });
    expect([config.host, config.port]).toEqual(['::1', 9090]);
  });
  it('treats an empty OILSKIN_PORT as unset', () => {
    expect(loadConfig({ OILSKIN_PORT: '', PORT: '3000' }).port).toBe(3000);
  });
  it('names the variable it read when the port is not an integer', () => {
    expect(() => loadConfig({ PORT: 'eighty' })).toThrow(/^PORT must be an integer/);
    expect(() => loadConfig({ OILSKIN_PORT: '80.5', PORT: '3000' })).toThrow(/^OILSKIN_PORT must be an integer/);
  });
});
