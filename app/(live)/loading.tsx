// The live board waits like the desk pages it sits beside.
export { default } from '../(desk)/loading';
