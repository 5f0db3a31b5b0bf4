export { PeopleScreen as default } from '../../features/admin/PeopleScreen';
