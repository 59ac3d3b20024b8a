// npm run db:stop: stops the project's MariaDB instance by its pid.
import { stopMariaDb } from './lib/mariadb-instance';
import { APP_DATA, TEST_DATA } from './lib/paths';

const target = process.argv[2] === 'test' ? TEST_DATA : APP_DATA;
const stopped = await stopMariaDb(target.dataDir);
console.log(stopped ? `Stopped MariaDB (${target.dataDir}).` : 'MariaDB was not running.');
