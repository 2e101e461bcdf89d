// ESLint rule: the walls between front-end features and between back-end modules (DEVELOPERS.md, "Module
// walls"). A front-end feature reaches another feature only through that feature's `index.ts`; a back-end
// module never imports another module's repository; `common/` never imports from `modules/`.
import { dirname, relative, resolve, sep } from 'node:path';

const FEATURES = `frontend${sep}src${sep}features${sep}`;
const MODULES = `backend${sep}src${sep}modules${sep}`;
const COMMON = `backend${sep}src${sep}common${sep}`;

/** `frontend/src/features/tasks/api/x.ts` -> 'tasks' (the folder right after the marker), else null. */
function ownerOf(file, marker) {
  const at = file.indexOf(marker);
  if (at === -1) return null;
  return file.slice(at + marker.length).split(sep)[0] ?? null;
}

function breach(fromFile, target) {
  const fromFeature = ownerOf(fromFile, FEATURES);
  const toFeature = ownerOf(target, FEATURES);
  if (fromFeature && toFeature && fromFeature !== toFeature) {
    const inside = target.slice(target.indexOf(FEATURES) + FEATURES.length + toFeature.length + 1);
    if (!/^index\.(js|ts|tsx)$/.test(inside)) return `import the "${toFeature}" feature through its index.ts, not ${inside}`;
  }
  const fromModule = ownerOf(fromFile, MODULES);
  const toModule = ownerOf(target, MODULES);
  if (fromModule && toModule && fromModule !== toModule && /\.repository\.(js|ts)$/.test(target)) {
    return `module "${fromModule}" must call the "${toModule}" module's service, not its repository`;
  }
  if (fromFile.includes(COMMON) && toModule) return 'common/ must not depend on modules/';
  return null;
}

export default {
  meta: { type: 'problem', schema: [], messages: { wall: '{{why}}' } },
  create(context) {
    const file = context.filename;
    const check = (node) => {
      const spec = node.source?.value;
      if (typeof spec !== 'string' || !spec.startsWith('.')) return;
      const why = breach(file, resolve(dirname(file), spec));
      if (why) context.report({ node: node.source, messageId: 'wall', data: { why } });
    };
    return { ImportDeclaration: check, ExportNamedDeclaration: check, ExportAllDeclaration: check, ImportExpression: check };
  },
};

export { breach, relative };
