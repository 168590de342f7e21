import Database from 'better-sqlite3';
import express from 'express';

/**
 * The yardstick: Express and better-sqlite3 with nothing between them, answering one row as
 * JSON. Run as its own process by the bench (argv: port, database file).
 */
const [port, databasePath] = process.argv.slice(2);
const db = new Database(databasePath);
db.pragma('journal_mode = WAL');
db.exec('CREATE TABLE IF NOT EXISTS booths (id INTEGER PRIMARY KEY, name TEXT NOT NULL, volume_m3 REAL NOT NULL)');
if ((db.prepare('SELECT COUNT(*) AS n FROM booths').get() as { n: number }).n === 0) {
  const insert = db.prepare('INSERT INTO booths (name, volume_m3) VALUES (?, ?)');
  db.transaction(() => {
    for (let i = 1; i <= 100; i += 1) insert.run(`Booth ${i}`, 50 + i);
  })();
}
const oneBooth = db.prepare('SELECT id, name, volume_m3 FROM booths WHERE id = ?');

const app = express();
app.get('/health', (_req, res) => {
  res.json({ ok: true });
});
app.get('/one', (_req, res) => {
  res.json({ booth: oneBooth.get(1 + Math.floor(Math.random() * 100)) });
});
app.listen(Number(port), '127.0.0.1');
