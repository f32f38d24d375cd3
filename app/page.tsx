import { redirect } from 'next/navigation';
import { currentViewer } from '@/lib/dal';

export default async function Home() {
  const viewer = await currentViewer();
  redirect(viewer ? '/portfolio' : '/sign-in');
}
