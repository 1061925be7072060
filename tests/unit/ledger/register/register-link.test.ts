import { describe, expect, it } from 'vitest';
import { demoRegister } from '../../../../src/ledger/register/demo-register.ts';
import { machineAsCandidate } from '../../../../src/ledger/register/machine-candidate.ts';
import {
  linkStatus,
  projectLinkStatus,
  updateLinkedCandidates,
} from '../../../../src/ledger/register/register-link.ts';
import { demoProject } from '../../../../src/ledger/model/demo.ts';
import { validateProject } from '../../../../src/ledger/validate/validate.ts';
import { parseProjectFile, serializeProject } from '../../../../src/ledger/file/project-file.ts';
import type { Project } from '../../../../src/ledger/model/model.ts';

function projectWithLinked(): Project {
  const project = demoProject();
  const register = demoRegister();
  const duty = project.duties[0]!;
  const copy = { ...machineAsCandidate(register.machines[0]!, 'reg1', duty.id, 200), fixedCharges: 350, pinned: true };
  const hired = machineAsCandidate(register.machines[3]!, 'reg2', duty.id, 200, 'hire');
  return { ...project, candidates: [...project.candidates, copy, hired] };
}

describe('register machines as candidates', () => {
  it('machineAsCandidate copies the figures, converts the life to working days and remembers the machine', () => {
    const c = machineAsCandidate(demoRegister().machines[0]!, 'x1', 'd1', 200);
    // worked by hand: 8 years × 200 working days = 1,600 days
    expect(c.cost).toEqual({ kind: 'purchase', price: 165000, resaleValue: 55000, lifeDays: 1600 });
    expect(c).toMatchObject({
      id: 'x1',
      dutyId: 'd1',
      lwaDb: 102,
      operatorLpaDb: 76,
      registerLink: { machineId: 'm1', basis: 'purchase' },
    });
  });

  it('a project with linked candidates validates and round-trips through its file', () => {
    const project = projectWithLinked();
    expect(validateProject(project)).toEqual([]);
    expect(parseProjectFile(serializeProject(project))).toEqual({ project });
  });

  it('a register change shows as differences and reaches the project only on request', () => {
    const project = projectWithLinked();
    const register = demoRegister();
    expect(projectLinkStatus(project, register).get('reg1')).toEqual({ state: 'same' });

    register.machines[0]!.lwaDb = 101;
    register.machines[0]!.purchase!.price = 160000;
    const status = linkStatus(
      project.candidates.find((c) => c.id === 'reg1')!,
      register,
    );
    expect(status).toEqual({
      state: 'differs',
      differences: [
        { field: 'lwaDb', label: 'LWA, dB', inProject: '102', inRegister: '101' },
        { field: 'cost.price', label: 'price', inProject: '165000', inRegister: '160000' },
      ],
    });
    // The project itself is untouched by the register change.
    expect(project.candidates.find((c) => c.id === 'reg1')!.lwaDb).toBe(102);

    const updated = updateLinkedCandidates(project, register, ['reg1']);
    const c = updated.candidates.find((x) => x.id === 'reg1')!;
    expect(c.lwaDb).toBe(101);
    expect(c.cost).toMatchObject({ kind: 'purchase', price: 160000 });
    // The project's own choices stay.
    expect(c).toMatchObject({ fixedCharges: 350, pinned: true, dutyId: project.duties[0]!.id });
    expect(projectLinkStatus(updated, register).get('reg1')).toEqual({ state: 'same' });
    // A candidate not asked for is left alone; the original project object is not changed.
    expect(updateLinkedCandidates(project, register, [])).toBe(project);
  });

  it('an edit in the project shows as a difference too, and a hire copy compares hire rates', () => {
    const project = projectWithLinked();
    const register = demoRegister();
    register.machines[3]!.hire!.dayRate = 75;
    expect(
      linkStatus(
        project.candidates.find((c) => c.id === 'reg2')!,
        register,
      ),
    ).toEqual({
      state: 'differs',
      differences: [{ field: 'cost.dayRate', label: 'day rate', inProject: '70', inRegister: '75' }],
    });
  });

  it('a machine gone from the register is reported missing, and updating leaves the candidate as it is', () => {
    const project = projectWithLinked();
    const register = { ...demoRegister(), machines: demoRegister().machines.slice(1) };
    expect(projectLinkStatus(project, register).get('reg1')).toEqual({ state: 'missing' });
    expect(updateLinkedCandidates(project, register, ['reg1'])).toBe(project);
  });

  it('updating drops the unread text of replaced fields only', () => {
    const project = {
      ...projectWithLinked(),
      unreadCells: { 'candidates/reg1/lwaDb': 'loud', 'candidates/reg1/fixedCharges': 'tbc' },
    };
    const updated = updateLinkedCandidates(project, demoRegister(), ['reg1']);
    expect(updated.unreadCells).toEqual({ 'candidates/reg1/fixedCharges': 'tbc' });
  });

  it('validateProject names a broken register link', () => {
    const project = projectWithLinked();
    const bad = {
      ...project,
      candidates: project.candidates.map((c) =>
        c.id === 'reg1' ? { ...c, registerLink: { machineId: 'm1', basis: 'lease' as 'hire' } } : c,
      ),
    };
    expect(validateProject(bad).map((p) => p.message)).toContain(
      'Candidate "Tarnfield TX200 excavator 20 t", register cost basis: "lease" is not accepted (use one of "hire", "purchase")',
    );
  });
});
