import { parseWithoutEval } from '@barwright/contracts/zod-without-eval';

// The CSP forbids eval (script-src 'self'); zod must know before the contracts build their schemas,
// so main.ts imports this module first.
parseWithoutEval();
