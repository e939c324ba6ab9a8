import 'reflect-metadata';
import { DataSource, DataSourceOptions } from 'typeorm';
import { ENTITIES } from './entities';
import { SnakeNamingStrategy } from './snake-naming.strategy';

/** Options shared by the app and the CLI; migrations never run through `synchronize`. */
export function dataSourceOptions(url: string, poolSize = 20): DataSourceOptions {
  return {
    type: 'postgres',
    url,
    entities: ENTITIES,
    migrations: [__dirname + '/migrations/*.{js,ts}'],
    namingStrategy: new SnakeNamingStrategy(),
    synchronize: false,
    extra: { max: poolSize },
  };
}

// The TypeORM CLI's data source (`typeorm migration:generate -d dist/database/data-source.js`).
export default new DataSource(dataSourceOptions(process.env.DATABASE_URL ?? 'postgres://localhost/covalent'));
