import { PageSkeleton } from '@/app/_components/page-skeleton';

export default function Loading() {
  return <PageSkeleton />;
}
