export { ForgotPasswordScreen as default } from '../../features/auth/ForgotPasswordScreen';
