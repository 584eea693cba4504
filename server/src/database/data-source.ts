import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { validateEnvironment } from '../config/environment';
import { typeormOptions } from './typeorm-options';

/** The TypeORM CLI's data source: `typeorm migration:run -d dist/database/data-source.js`. */
export default new DataSource(typeormOptions(validateEnvironment(process.env).DATABASE_URL));
