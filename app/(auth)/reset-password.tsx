export { ResetPasswordScreen as default } from '../../features/auth/ResetPasswordScreen';
