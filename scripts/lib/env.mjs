// The environment the API and its scripts get for one instance.
import path from 'node:path';

export function apiEnv(root, inst, secret, extra = {}) {
  return {
    ...process.env,
    DB_HOST: '127.0.0.1',
    DB_PORT: String(inst.port),
    DB_NAME: extra.DB_NAME ?? 'polecourt',
    DB_USER: 'polecourt',
    DB_PASSWORD: secret.dbPassword,
    SESSION_SECRET: secret.sessionSecret,
    POLECOURT_DATA_DIR: inst.dir,
    POLECOURT_ROOT: root,
    ...extra,
  };
}

export function tsxBin(root) {
  return path.join(root, 'apps/api/node_modules/.bin/tsx');
}
