export { RegisterScreen as default } from '../../features/register/RegisterScreen';
