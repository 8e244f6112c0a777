export { theme } from './theme';
