export { default } from '../../loading';
