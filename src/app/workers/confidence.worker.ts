/**
 * The probability of compliance off the main thread: evaluates the project, then simulates
 * a fleet (ledger/uncertainty/confidence.ts) or searches the cheapest fleet at a confidence
 * (ledger/optimise/confidence-fleet.ts, HiGHS loaded on first use). Results are plain data.
 */
import wasmUrl from 'highs/runtime?url';
import type { LpSolver } from '../../ledger/optimise/solver.ts';
import { loadHighsSolver } from '../../ledger/optimise/load-highs.ts';
import { CONFIDENCE_LEVELS, confidenceFleet } from '../../ledger/optimise/confidence-fleet.ts';
import { confidenceCurve } from '../../ledger/optimise/confidence-curve.ts';
import { complianceConfidence } from '../../ledger/uncertainty/confidence.ts';
import { evaluateProject } from '../../ledger/prediction/evaluate.ts';
import { candidateChances } from '../../ledger/uncertainty/candidate-chance.ts';
import type { ConfidenceReply, ConfidenceRequest } from '../services/confidence-client.ts';

const scope = self as unknown as {
  onmessage: ((event: MessageEvent<ConfidenceRequest>) => void) | null;
  postMessage(message: ConfidenceReply): void;
};

let solver: Promise<LpSolver> | undefined;

scope.onmessage = (event) => {
  const request = event.data;
  void (async () => {
    try {
      if (request.kind === 'figures') {
        const evaluation = evaluateProject(request.project, request.fleet);
        scope.postMessage({
          id: request.id,
          ok: true,
          kind: 'figures',
          result: complianceConfidence(request.project, evaluation),
        });
        return;
      }
      if (request.kind === 'chances') {
        const evaluation = evaluateProject(request.project, request.fleet);
        scope.postMessage({
          id: request.id,
          ok: true,
          kind: 'chances',
          result: candidateChances(request.project, evaluation, request.fleet, request.dutyId),
        });
        return;
      }
      solver ??= loadHighsSolver({ locateFile: () => wasmUrl });
      const loaded = await solver;
      const evaluation = evaluateProject(request.project);
      if (request.kind === 'costs') {
        scope.postMessage({
          id: request.id,
          ok: true,
          kind: 'costs',
          result: confidenceCurve(request.project, evaluation, CONFIDENCE_LEVELS, loaded, {
            name: request.fleetName,
            fleet: request.fleet,
          }),
        });
        return;
      }
      const result = confidenceFleet(
        request.project,
        evaluation,
        { confidence: request.confidence, ...(request.budget === undefined ? {} : { budget: request.budget }) },
        loaded,
      );
      scope.postMessage({ id: request.id, ok: true, kind: 'fleet', result });
    } catch (e) {
      if (
        (request.kind === 'fleet' || request.kind === 'costs') &&
        solver &&
        !(e instanceof Error && e.name === 'InputError')
      )
        solver = undefined;
      scope.postMessage({ id: request.id, ok: false, message: e instanceof Error ? e.message : String(e) });
    }
  })();
};
