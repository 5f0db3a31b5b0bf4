export { SignInScreen as default } from '../../features/auth/SignInScreen';
