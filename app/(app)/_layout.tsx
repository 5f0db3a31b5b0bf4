export { SignedInLayout as default } from '../../features/shell/SignedInLayout';
