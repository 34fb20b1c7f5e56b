/**
 * The semantic token types and modifiers, apart from the feature so that the server can
 * announce them at start-up without loading the analysis code.
 */
import type { SemanticTokensLegend } from 'vscode-languageserver-types';

export const TYPES = ['keyword', 'namespace', 'variable', 'enumMember', 'property', 'number', 'type', 'string', 'comment', 'operator'] as const;
export const MODIFIERS = ['declaration', 'defaultLibrary'] as const;
export type TokenType = (typeof TYPES)[number];
export type Modifier = (typeof MODIFIERS)[number];

export const SEMANTIC_TOKENS_LEGEND: SemanticTokensLegend = { tokenTypes: [...TYPES], tokenModifiers: [...MODIFIERS] };
