export { default } from '../loading';
