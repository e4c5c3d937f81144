import * as mariadb from 'mariadb';

/** One plain MariaDB connection from a DATABASE_URL, for the benchmark's own SQL. */
export function connectTo(databaseUrl: string): Promise<mariadb.Connection> {
  const url = new URL(databaseUrl);
  return mariadb.createConnection({
    host: url.hostname,
    port: Number(url.port || 3306),
    user: decodeURIComponent(url.username),
    password: decodeURIComponent(url.password),
    database: url.pathname.slice(1),
  });
}
