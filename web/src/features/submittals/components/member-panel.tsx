import { makeStyles, Subtitle2, Text, tokens } from '@fluentui/react-components';
import type { CalcDocument, CalcMember } from 'ligament/calc';
import { buildDrawing, withClaimedChain } from 'ligament/draw';
import { codeLabel, type MemberResult } from 'ligament/engine';
import { useMemo, useState } from 'react';
import { ClassBadge, SeverityBadge } from '@/components/finding-badges';
import { HorizontalScroll } from '@/components/horizontal-scroll';
import { EmptyState } from '@/components/states';
import { CAUTION } from 'ligament/engine';
import type { Schema } from '@/lib/api-schemas';
import { ChainsTable } from './chains-table';
import { ClaimsComparison } from './claims-comparison';
import { DrawingViewer } from './drawing-viewer';
import type { DrawnChain } from './member-drawing';

const useStyles = makeStyles({
  // The drawing takes the panel's width, so its labels can be read without zooming in.
  top: { display: 'flex', flexDirection: 'column', gap: 0 },
  block: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalS,
    minWidth: 0,
    marginTop: tokens.spacingVerticalL,
  },
  findings: {
    listStyleType: 'none',
    margin: 0,
    padding: 0,
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalS,
  },
  finding: {
    padding: tokens.spacingHorizontalM,
    borderRadius: tokens.borderRadiusMedium,
    backgroundColor: tokens.colorNeutralBackground2,
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalXS,
  },
  legend: { color: tokens.colorNeutralForeground2 },
  findingHead: { display: 'flex', gap: tokens.spacingHorizontalS, alignItems: 'center', flexWrap: 'wrap' },
  code: { fontFamily: tokens.fontFamilyMonospace, fontWeight: tokens.fontWeightSemibold },
  pointer: {
    fontFamily: tokens.fontFamilyMonospace,
    color: tokens.colorNeutralForeground3,
    fontSize: tokens.fontSizeBase200,
  },
});

/**
 * The chain the file claims controls: its controllingChain, or else the claimed chain with the least
 * claimed net width; none when the file claims no chain.
 */
export function claimedControllingChain(claims: CalcMember['claims']) {
  if (claims?.controllingChain) return claims.controllingChain;
  const withWidth = (claims?.chains ?? []).filter((c) => c.netWidth !== undefined);
  return withWidth.reduce<(typeof withWidth)[number] | undefined>(
    (least, c) => (!least || (c.netWidth ?? Infinity) < (least.netWidth ?? Infinity) ? c : least),
    undefined,
  );
}

export interface MemberPanelProps {
  readonly document: CalcDocument;
  readonly member: CalcMember;
  readonly result: MemberResult;
  readonly findings: readonly Schema<'DiscrepancyDto'>[];
}

/** One member: its drawing, the least chains per direction, claimed against recomputed, and its findings. */
export function MemberPanel({ document, member, result, findings }: MemberPanelProps) {
  const styles = useStyles();
  const [highlighted, setHighlighted] = useState<string | null>(null);
  const units = document.profile.units;
  const drawing = useMemo(() => {
    const sheet = buildDrawing(member.input, result, {
      units,
      profile: document.profile,
      project: document.meta.project,
      caution: CAUTION,
    });
    const claimed = claimedControllingChain(member.claims);
    return claimed ? withClaimedChain(sheet, claimed) : sheet;
  }, [member, result, units, document]);
  const chains: DrawnChain[] = result.directions.flatMap((d) =>
    d.leastChains.map((c) => ({ direction: d.direction, holes: c.holes })),
  );
  const governingChain =
    result.directions.find((d) => d.direction === result.governingDirection)?.governing?.holes ?? null;

  return (
    <div>
      <div className={styles.top}>
        <div className={styles.block}>
          <Subtitle2 as="h3">
            Drawing, scale 1:{drawing.scale}, dimensions in {units === 'in' ? 'inches' : 'millimetres'}
          </Subtitle2>
          <DrawingViewer drawing={drawing} chains={chains} highlighted={highlighted} />
          <Text size={200} className={styles.legend}>
            Hover or focus a chain in the tables below to trace it on the plate. Checked to{' '}
            {codeLabel(document.profile)}.
          </Text>
        </div>
        <div className={styles.block}>
          <Subtitle2 as="h3">Claimed against recomputed</Subtitle2>
          <ClaimsComparison
            claims={member.claims}
            units={units}
            recomputed={{
              Ag: result.Ag,
              An: result.An,
              U: result.U,
              Ae: result.Ae,
              yielding: result.yielding.available,
              rupture: result.rupture.available,
              available: result.governing.available,
              ...(result.blockShear ? { blockShear: result.blockShear.available } : {}),
              governs: result.governing.limitState,
              controllingChain: governingChain,
            }}
          />
        </div>
      </div>
      {result.directions.map((d) => (
        <div key={d.direction} className={styles.block}>
          <Subtitle2 as="h3">
            Load from {d.direction}: {d.leastChains.length} least chain{d.leastChains.length === 1 ? '' : 's'}
          </Subtitle2>
          {d.leastChains.length === 0 ? (
            <Text>No chain can form under the full load from this direction.</Text>
          ) : (
            <HorizontalScroll label={`Least chains, load from ${d.direction}, table`} minWidth="560px">
              <ChainsTable
                direction={d.direction}
                chains={d.leastChains}
                governing={d.governing?.holes ?? null}
                units={units}
                highlighted={highlighted}
                onHighlight={setHighlighted}
              />
            </HorizontalScroll>
          )}
        </div>
      ))}
      <div className={styles.block}>
        <Subtitle2 as="h3">Findings for {member.input.id}</Subtitle2>
        {findings.length === 0 ? (
          <EmptyState title="No findings">
            Every claim for this member agrees with the recomputation.
          </EmptyState>
        ) : (
          <ul className={styles.findings}>
            {findings.map((f) => (
              <li key={f.id} className={styles.finding}>
                <div className={styles.findingHead}>
                  <SeverityBadge severity={f.severity} />
                  <span className={styles.code}>{f.code}</span>
                  <Text>{f.name}</Text>
                  <ClassBadge findingClass={f.class} />
                  {f.direction && <Text size={200}>load from {f.direction}</Text>}
                </div>
                <Text>{f.message}</Text>
                <span className={styles.pointer}>{f.pointer}</span>
              </li>
            ))}
          </ul>
        )}
      </div>
    </div>
  );
}
