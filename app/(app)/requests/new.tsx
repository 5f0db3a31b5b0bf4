export { NewRequestScreen as default } from '../../../features/requests/NewRequestScreen';
