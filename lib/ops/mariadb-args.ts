/** Command-line arguments for the MariaDB client tools from a mysql:// URL (the password goes in MYSQL_PWD, not argv). */
export function mariadbArgs(url: string) {
  const u = new URL(url);
  const database = decodeURIComponent(u.pathname.replace(/^\//, ''));
  return {
    database,
    password: decodeURIComponent(u.password),
    args: ['--no-defaults', `--host=${u.hostname}`, `--port=${u.port || '3306'}`, `--user=${decodeURIComponent(u.username)}`],
  };
}
