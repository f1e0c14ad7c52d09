/**
 * The one task file the pool loads. Each named export is a task, chosen with
 * `pool.run(data, { name })`; tasks are thin wrappers over shared/.
 */
export { summarise } from './summarise';
