export { RequestDetailScreen as default } from '../../../features/requests/RequestDetailScreen';
