export { AcceptInvitationScreen as default } from '../../features/auth/AcceptInvitationScreen';
