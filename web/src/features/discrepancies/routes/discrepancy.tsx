import { useNavigate, useParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { Section } from '@/components/section';
import { ErrorState, LoadingState } from '@/components/states';
import { paths } from '@/config/paths';
import { useDiscrepancy } from '../api/get-discrepancy';
import { DiscrepancyDetail } from '../components/discrepancy-detail';

/** A discrepancy on its own page: the link mail and reports point to. */
export function Component() {
  const discrepancyId = Number(useParams().discrepancyId);
  const navigate = useNavigate();
  const detail = useDiscrepancy(discrepancyId);
  if (detail.isPending) return <LoadingState label="Loading the discrepancy…" />;
  if (detail.isError) return <ErrorState error={detail.error} onRetry={() => void detail.refetch()} />;
  return (
    <>
      <PageHeader
        eyebrow={`Discrepancy #${detail.data.id}`}
        title={`${detail.data.code} ${detail.data.memberId ?? ''}`}
        description={detail.data.submittalTitle}
      />
      <Section>
        <DiscrepancyDetail
          discrepancyId={discrepancyId}
          projectId={detail.data.projectId}
          onClose={() => navigate(paths.discrepancies.getHref({ projectId: detail.data.projectId }))}
        />
      </Section>
    </>
  );
}
