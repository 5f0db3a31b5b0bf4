export { DeskScreen as default } from '../../features/requests/DeskScreen';
