// The net-section engine: pure functions, numbers in, typed results out. This file is its public
// surface, in the order of the calculation (cli/src/engine/README.md); what is not listed here is
// internal to the package and may change without notice.
export type * from './types.js';
export type * from './findings/types.js';
export type * from './sections/types.js';
export type { Point } from './geometry/point.js';

// Holes: the code's hole tables, the width a hole deducts, edge distances, layout problems.
export { holeTableInch, type HoleTableRow } from './holes/holeTableInch.js';
export { holeTableMetric } from './holes/holeTableMetric.js';
export { holeWidth } from './holes/holeWidth.js';
export { memberHoleWidth } from './holes/memberHoleWidth.js';
export { minimumEdgeDistance } from './holes/minimumEdgeDistance.js';
export { inspectLayout } from './holes/inspectLayout.js';

// The member built once: hole widths and the plate's layout or the rolled shape's unfolded section.
export { memberModel } from './member/memberModel.js';
export { memberLayout } from './member/memberLayout.js';

// Chains and which of them can form under the full load; the equal-share rule.
export { staggerTerm } from './chains/staggerTerm.js';
export { netWidth } from './chains/netWidth.js';
export { chainOf } from './chains/chainOf.js';
export { chainRejection } from './chains/chainRejection.js';
export { fractureSides } from './chains/fractureSides.js';
export { enumerateChains, type EnumerateOptions } from './chains/enumerateChains.js';
export { leastChains } from './chains/leastChains.js';
export { rankChains } from './chains/rankChains.js';
export { equalShareChain } from './chains/equalShareChain.js';

// Rolled shapes as connected flat elements (sections/README.md).
export { angle, type AngleOptions } from './sections/angle.js';
export { tee } from './sections/tee.js';
export { wShape } from './sections/wShape.js';
export { channel } from './sections/channel.js';
export { plateSection } from './sections/plateSection.js';
export { unfold, type UnfoldOptions } from './sections/unfold.js';
export { analyseSection, type AnalyseSectionOptions } from './sections/analyseSection.js';
export { SectionError, type SectionErrorCode } from './sections/sectionError.js';

// Net area, shear lag, strengths and block shear of a member.
export { analyseModel } from './analyseModel.js';
export { analyseMember } from './analyseMember.js';
export { designMethodOf } from './strength/designMethodOf.js';
export { codeLabel } from './strength/codeLabel.js';

// The audit: claims against the recomputation, findings and how they read.
export { auditMember } from './findings/auditMember.js';
export { auditCalc } from './findings/auditCalc.js';
export { FINDING_CATALOGUE } from './findings/findingCatalogue.js';
export { FINDING_CLASSES, SEVERITIES } from './findings/findingClasses.js';
export { findingRule } from './findings/findingRule.js';
export { withinTolerance, DEFAULT_TOLERANCE } from './findings/withinTolerance.js';
export { formatQuantity, type Dimension, type FormatQuantityOptions } from './findings/formatQuantity.js';
export { unitSymbol } from './findings/unitSymbol.js';
export { quantityText } from './findings/quantityText.js';
export { findingQuantity } from './findings/findingQuantity.js';
export { formatDirection } from './findings/formatDirection.js';
export { CAUTION } from './caution.js';
export { EngineError, type EngineErrorCode } from './engineError.js';
export { ENGINE_VERSION } from './engineVersion.js';
