export { InvitationPanel } from './components/invitation-panel';
