import { EmptyState } from '@/app/_components/empty-state';

export default function CaseNotFound() {
  return (
    <EmptyState title="No such case">
      It does not exist, or it is not one of your carrier&apos;s cases.
    </EmptyState>
  );
}
