// Tests always talk to the test stack (its own ports, database, Redis and bucket), never to the
// data of `npm start`, whatever the shell exports. `npm test` starts that stack.
import 'reflect-metadata';
import { serviceEnv, stackConfig } from '../../scripts/stack/config';

Object.assign(process.env, serviceEnv(stackConfig('test')));
