export { ConditionsScreen as default } from '../../features/conditions/ConditionsScreen';
