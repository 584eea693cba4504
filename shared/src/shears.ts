/** Edge types of hair and grooming shears (trade terms). Micro-serrated counts as serrated. */
export const EDGE_TYPES = ['beveled', 'convex', 'semi-convex', 'serrated'] as const;
export type EdgeType = (typeof EDGE_TYPES)[number];

/** Tool kinds (trade terms). */
export const TOOL_KINDS = ['straight', 'curved', 'thinning', 'blending', 'chunker'] as const;
export type ToolKind = (typeof TOOL_KINDS)[number];

export const HANDEDNESS = ['right', 'left'] as const;
export type Handedness = (typeof HANDEDNESS)[number];
