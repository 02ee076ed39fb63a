import { Badge } from '@fluentui/react-components';
import {
  CheckmarkCircleRegular,
  CheckmarkStarburstRegular,
  ArrowReplyRegular,
  ArrowUndoRegular,
  CircleRegular,
  SubtractCircleRegular,
} from '@fluentui/react-icons';
import type { ReactElement } from 'react';

export type DiscrepancyStatus = 'raised' | 'answered' | 'accepted' | 'returned' | 'waived' | 'resolved';

export const STATUSES: readonly DiscrepancyStatus[] = [
  'raised',
  'answered',
  'returned',
  'accepted',
  'waived',
  'resolved',
];
export const OPEN_STATUSES: readonly DiscrepancyStatus[] = ['raised', 'answered', 'returned'];

export const statusLabels: Record<DiscrepancyStatus, string> = {
  raised: 'Raised',
  answered: 'Answered',
  returned: 'Returned',
  accepted: 'Accepted',
  waived: 'Waived',
  resolved: 'Resolved',
};

const appearance: Record<
  DiscrepancyStatus,
  { color: 'danger' | 'warning' | 'success' | 'informative' | 'subtle'; icon: ReactElement }
> = {
  raised: { color: 'danger', icon: <CircleRegular /> },
  answered: { color: 'informative', icon: <ArrowReplyRegular /> },
  returned: { color: 'warning', icon: <ArrowUndoRegular /> },
  accepted: { color: 'success', icon: <CheckmarkCircleRegular /> },
  waived: { color: 'subtle', icon: <SubtractCircleRegular /> },
  resolved: { color: 'success', icon: <CheckmarkStarburstRegular /> },
};

export interface StatusBadgeProps {
  readonly status: string;
}

export function StatusBadge({ status }: StatusBadgeProps) {
  const a = appearance[status as DiscrepancyStatus] ?? appearance.raised;
  return (
    <Badge appearance="tint" shape="rounded" color={a.color} icon={a.icon}>
      {statusLabels[status as DiscrepancyStatus] ?? status}
    </Badge>
  );
}
