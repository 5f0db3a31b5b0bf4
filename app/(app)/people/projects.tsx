export { ProjectsScreen as default } from '../../../features/admin/ProjectsScreen';
