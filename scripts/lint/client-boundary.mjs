// A client component ('use client') runs in the browser: it may take types from server/ and models/, never
// values, or the server's code (and its secrets) would be bundled for the browser. What client and server
// share at run time lives in lib/.
const SERVER_SIDE = /^(@\/|(\.\.\/)+)(server|models)(\/|$)/;

/** @type {import('eslint').Rule.RuleModule} */
export default {
  meta: {
    type: 'problem',
    docs: { description: "no run-time import of server/ or models/ in a 'use client' module" },
    messages: { serverSide: "'{{source}}' is server code: a client component may import its types only (import type), or move what it needs to lib/." },
    schema: [],
  },
  create(context) {
    const body = context.sourceCode.ast.body;
    const isClient = body.some((node) => node.type === 'ExpressionStatement' && node.directive === 'use client');
    if (!isClient) return {};
    return {
      ImportDeclaration(node) {
        if (node.importKind === 'type' || !SERVER_SIDE.test(node.source.value)) return;
        if (node.specifiers.length > 0 && node.specifiers.every((s) => s.importKind === 'type')) return;
        context.report({ node, messageId: 'serverSide', data: { source: node.source.value } });
      },
    };
  },
};
