// The editor-host install runs npm from inside `npm test`; the outer npm's variables must not
// reach the inner one (they named the system Node 20 and made code-server's install refuse).
import { spawnSync } from 'node:child_process';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';

const script = resolve(import.meta.dirname, '../../scripts/e2e/clean-npm-env.sh');

function envAfterCleaning(extra: Record<string, string>): Record<string, string> {
  const r = spawnSync('bash', ['-c', `source "${script}"; env -0`], { env: { PATH: process.env.PATH ?? '', HOME: '/nonexistent', ...extra }, encoding: 'utf8' });
  expect(r.status).toBe(0);
  return Object.fromEntries(r.stdout.split('\0').filter(Boolean).map((kv) => [kv.slice(0, kv.indexOf('=')), kv.slice(kv.indexOf('=') + 1)]));
}

describe('clean-npm-env.sh', () => {
  it('unsets every npm_* variable an outer npm exports, in any case', () => {
    const env = envAfterCleaning({
      npm_config_user_agent: 'npm/11.19.1 node/v20.20.2 linux x64',
      npm_config_nodedir: '/usr/include/node',
      NPM_CONFIG_PREFIX: '/tmp/x',
      npm_package_name: 'sublevel',
      npm_lifecycle_event: 'test',
      npm_execpath: '/usr/lib/node_modules/npm/bin/npm-cli.js',
      INIT_CWD: '/work/main',
    });
    expect(Object.keys(env).filter((k) => /^npm_/i.test(k) || k === 'INIT_CWD')).toEqual([]);
  });

  it('keeps everything else, including values that merely mention npm', () => {
    const env = envAfterCleaning({ SUBLEVEL_E2E_HOME: '/tmp/home', NOTE: 'npm_config_x=1' });
    expect(env.SUBLEVEL_E2E_HOME).toBe('/tmp/home');
    expect(env.NOTE).toBe('npm_config_x=1');
    expect(env.PATH).toBe(process.env.PATH);
  });
});
