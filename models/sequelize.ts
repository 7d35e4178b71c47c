import { Sequelize } from 'sequelize';
import * as mariadb from 'mariadb';

export interface DbConfig {
  host: string;
  port: number;
  database: string;
  username: string;
  password: string;
  poolMax: number;
}

// Weights are DECIMAL in the database; return them as strings and convert at the edge,
// never as floats the driver has already rounded.
export function createSequelize(cfg: DbConfig): Sequelize {
  return new Sequelize(cfg.database, cfg.username, cfg.password, {
    host: cfg.host,
    port: cfg.port,
    dialect: 'mariadb',
    dialectModule: mariadb,
    logging: false,
    timezone: '+00:00',
    pool: { max: cfg.poolMax, min: 0, idle: 10_000, acquire: 20_000 },
    dialectOptions: { connectTimeout: 5_000 },
    define: { underscored: true, timestamps: true },
  });
}
