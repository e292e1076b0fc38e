import type { EdgeTypes, NodeTypes } from '@xyflow/react';
import { ComponentNode } from './ComponentNode';
import { ConnectionEdge } from './ConnectionEdge';

/** The canvas's node and edge kinds, shared by the editor and the read-only revision drawing. */
export const CANVAS_NODE_TYPES: NodeTypes = { component: ComponentNode };
export const CANVAS_EDGE_TYPES: EdgeTypes = { connection: ConnectionEdge };
