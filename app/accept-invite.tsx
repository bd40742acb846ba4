import { AcceptInviteScreen } from '@/components/auth/accept-invite-screen';

export default AcceptInviteScreen;
