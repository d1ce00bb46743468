export { default } from '../../../loading';
