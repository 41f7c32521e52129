import { pageCaller } from '@/components/shell/require-caller';
import { TeamManager } from '@/components/team/team-manager';

export const metadata = { title: 'Team' };

export default async function TeamPage() {
  const caller = await pageCaller('/team');
  return <TeamManager userId={caller.id} />;
}
