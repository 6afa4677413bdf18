import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

let aptUpdated = false;

/**
 * Installs Debian packages when a needed binary is missing. As root we run apt-get ourselves
 * (non-interactive: CI has no terminal); otherwise we stop with the exact command to run.
 */
export function ensureDebianPackage(binary: string, packages: string[]): void {
  if (existsSync(binary)) return;
  const command = `apt-get update && apt-get install -y ${packages.join(' ')}`;
  if (typeof process.getuid !== 'function' || process.getuid() !== 0) {
    throw new Error(`${binary} is missing. Install it with:\n  sudo sh -c '${command}'`);
  }
  console.log(`[setup] ${binary} missing; installing ${packages.join(', ')} from Debian's packages…`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  if (!aptUpdated) {
    execFileSync('apt-get', ['update', '-qq'], { stdio: 'inherit', env });
    aptUpdated = true;
  }
  const result = spawnSync('apt-get', ['install', '-y', '-qq', '--no-install-recommends', ...packages], {
    stdio: 'inherit',
    env,
  });
  if (result.status !== 0 || !existsSync(binary)) {
    throw new Error(`Installing ${packages.join(' ')} failed; run: ${command}`);
  }
}
