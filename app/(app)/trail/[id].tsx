export { RequestTrailScreen as default } from '../../../features/trail/RequestTrailScreen';
