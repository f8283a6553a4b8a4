// The profile page waits like the field screens it belongs to.
export { default } from '../(field)/today/loading';
