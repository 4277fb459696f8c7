// The MikroORM CLI's entry (`npx mikro-orm migration:create` in backend/, with the DB_* variables set).
import { DatabaseEnv, validateEnvAs } from '../config/env.validation';
import { buildOrmConfig } from './mikro-orm.config';

export default buildOrmConfig(validateEnvAs(DatabaseEnv, process.env));
