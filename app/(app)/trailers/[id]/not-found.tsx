import { EmptyState } from '@/app/_components/empty-state';

export default function TrailerNotFound() {
  return <EmptyState title="No such trailer">Check the unit number on the trailers list.</EmptyState>;
}
