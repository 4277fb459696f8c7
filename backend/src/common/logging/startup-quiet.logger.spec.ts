import { afterEach, describe, expect, it, vi } from 'vitest';
import { StartupQuietLogger } from './startup-quiet.logger';

describe('StartupQuietLogger', () => {
  afterEach(() => {
    vi.restoreAllMocks();
    delete process.env.LOG_STARTUP;
  });

  const printed = (act: (logger: StartupQuietLogger) => void): string => {
    const out: string[] = [];
    const capture = (chunk: unknown) => (out.push(String(chunk)), true);
    vi.spyOn(process.stdout, 'write').mockImplementation(capture);
    vi.spyOn(process.stderr, 'write').mockImplementation(capture);
    act(new StartupQuietLogger());
    return out.join('');
  };

  it('drops the per-route and per-module lines, keeps everything else', () => {
    const text = printed((l) => {
      l.log('Mapped {/api/health, GET} route', 'RouterExplorer');
      l.log('AuthModule dependencies initialized', 'InstanceLoader');
      l.log('listening on http://127.0.0.1:3000', 'Shoalbook');
      l.warn('a route warning', 'RouterExplorer');
    });
    expect(text).not.toContain('Mapped {/api/health');
    expect(text).not.toContain('dependencies initialized');
    expect(text).toContain('listening on http://127.0.0.1:3000');
    expect(text).toContain('a route warning');
  });

  it('prints the chatter again with LOG_STARTUP=verbose', () => {
    process.env.LOG_STARTUP = 'verbose';
    expect(printed((l) => l.log('Mapped {/api/health, GET} route', 'RouterExplorer'))).toContain(
      'Mapped {/api/health, GET} route',
    );
  });
});
