export { EditRequestScreen as default } from '../../../../features/requests/EditRequestScreen';
