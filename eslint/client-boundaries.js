import path from 'node:path';

/**
 * Boothwright's client boundaries, as two lint rules (no plugin needed):
 * - `feature-imports`: a feature never imports another feature, and src/api never imports a feature;
 * - `no-api-paths-in-features`: a feature names no `/api/…` address outside its own `api/` folder
 *   (a server resource's calls live in src/api, declared once).
 */
const featureOf = (file) => /[/\\]src[/\\]features[/\\]([^/\\]+)[/\\]/.exec(file)?.[1] ?? null;
const inApi = (file) => /[/\\]src[/\\]api[/\\]/.test(file);

const featureImports = {
  meta: {
    type: 'problem',
    messages: {
      crossFeature:
        'Features do not import each other ({{target}}): move the shared call to src/api, or compose both in src/app.',
      apiToFeature: 'src/api never imports a feature ({{target}}).',
    },
  },
  create(context) {
    const file = context.filename;
    const own = featureOf(file);
    const api = inApi(file);
    if (!own && !api) return {};
    const check = (node) => {
      const source = node.source?.value;
      if (typeof source !== 'string' || !source.startsWith('.')) return;
      const target = featureOf(path.resolve(path.dirname(file), source) + path.sep);
      if (!target) return;
      if (api) context.report({ node, messageId: 'apiToFeature', data: { target } });
      else if (target !== own) context.report({ node, messageId: 'crossFeature', data: { target } });
    };
    return {
      ImportDeclaration: check,
      ExportNamedDeclaration: check,
      ExportAllDeclaration: check,
      ImportExpression: check,
    };
  },
};

const noApiPathsInFeatures = {
  meta: {
    type: 'problem',
    messages: {
      apiPath:
        'A server address ({{text}}) belongs in src/api, where each resource is declared once; a call only this screen makes goes in this feature’s api/ folder.',
    },
  },
  create(context) {
    const file = context.filename;
    if (!featureOf(file) || /[/\\]src[/\\]features[/\\][^/\\]+[/\\]api[/\\]/.test(file)) return {};
    const check = (node, text) => {
      if (/^\/api(\/|$)/.test(text)) context.report({ node, messageId: 'apiPath', data: { text } });
    };
    return {
      Literal: (node) => typeof node.value === 'string' && check(node, node.value),
      TemplateLiteral: (node) => check(node, node.quasis[0]?.value.cooked ?? ''),
    };
  },
};

export const clientBoundaries = {
  rules: { 'feature-imports': featureImports, 'no-api-paths-in-features': noApiPathsInFeatures },
};
