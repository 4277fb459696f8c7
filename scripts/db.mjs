// `node scripts/db.mjs start|stop|sql [demo|test|bench]` — manage a profile's private MariaDB.
import { profile } from './lib/profile.mjs';
import { sqlAsRoot, startMariadb, stopMariadb } from './lib/mariadb.mjs';
import { fail, log } from './lib/run.mjs';

const [cmd = 'start', name = 'demo', ...rest] = process.argv.slice(2);
const p = profile(name);
try {
  if (cmd === 'start') {
    const r = await startMariadb(p);
    log(`MariaDB (${name}) ${r.reused ? 'already running' : 'started'} on 127.0.0.1:${p.dbPort}, database ${p.dbName}`);
  } else if (cmd === 'stop') {
    log((await stopMariadb(p)) ? `MariaDB (${name}) stopped` : `MariaDB (${name}) was not running`);
  } else if (cmd === 'sql') {
    process.stdout.write(sqlAsRoot(p, rest.join(' ')));
  } else {
    fail(`unknown command ${cmd}: use start, stop or sql`);
  }
} catch (e) {
  fail(e.message);
}
