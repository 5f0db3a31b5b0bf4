export { TrailSearchScreen as default } from '../../../features/trail/TrailSearchScreen';
