import { describe, expect, it } from 'vitest';
import { render, screen } from '@testing-library/svelte';
import Report from '../../../src/app/results/Report.svelte';
import { evaluateProject } from '../../../src/ledger/prediction/evaluate.ts';
import { optimiseResult, smallProject } from './fixtures.ts';
import { blankProject } from '../../../src/app/state/blank-project.ts';

describe('Report', () => {
  it('Report builds no content on screen until the page is printed', async () => {
    const project = smallProject();
    const { container } = render(Report, { props: { project, evaluation: evaluateProject(project) } });
    expect(container.querySelector('.pnl-report')?.textContent?.trim()).toBe('');
    window.dispatchEvent(new Event('beforeprint'));
    expect(container.querySelector('.pnl-report h1')?.textContent).toBe(project.name);
    window.dispatchEvent(new Event('afterprint'));
  });

  it('Report (preview) names the project, the method with its edition, the levels, the shortlist and the cautions', () => {
    const project = smallProject();
    project.propagation = {
      method: 'iso9613-2:1996',
      temperatureC: 10,
      humidityPct: 70,
      pressureKPa: 101.325,
      groundFactor: 0.5,
      groundMethod: 'alternative',
      sourceHeightM: 1.5,
      c0Db: 0,
    };
    render(Report, {
      props: { project, evaluation: evaluateProject(project), preview: true, date: '2 March 2026', locale: 'en-GB' },
    });
    expect(screen.getByRole('heading', { level: 1 }).textContent).toBe(project.name);
    expect(screen.getByText(/^ISO 9613-2:1996 Attenuation of sound during propagation outdoors/)).toBeTruthy();
    // D_Ω is set with its subscript: the setting's text reads "DΩ", and no raw underscore shows
    const ground = screen.getByText((_, el) => el?.tagName === 'DD' && /alternative method/.test(el.textContent ?? ''));
    expect(ground.textContent).toMatch(/alternative method \(clause 7\.3\.2, eq\. 10 with DΩ\)/);
    expect(ground.querySelector('sub')?.textContent).toBe('Ω');
    expect(screen.getByRole('heading', { name: 'Predicted levels with the baseline fleet' })).toBeTruthy();
    expect(screen.getByRole('heading', { name: 'Compliance statement for the baseline fleet' })).toBeTruthy();
    // the answer comes first: the matrix and the statement before the shortlist, the method after
    const order = screen.getAllByRole('heading', { level: 2 }).map((h) => h.textContent ?? '');
    expect(order.indexOf('Predicted levels with the baseline fleet')).toBeLessThan(order.indexOf('Shortlist'));
    expect(order.indexOf('Compliance statement for the baseline fleet')).toBeLessThan(order.indexOf('Shortlist'));
    expect(order.indexOf('Shortlist')).toBeLessThan(order.indexOf('Method'));
    expect(screen.getByRole('heading', { name: 'Shortlist' })).toBeTruthy();
    expect(screen.getAllByRole('heading', { name: /^Ranking: / }).length).toBe(project.duties.length);
    expect(screen.getByText(/ISO 9613-2 quotes an accuracy of about ±3 dB/)).toBeTruthy();
  });

  it('Report with an optimiser result shows the chosen fleet, the saving over the hand method and the trade-off chart', () => {
    const project = smallProject();
    const evaluation = evaluateProject(project);
    render(Report, {
      props: { project, evaluation, optimise: optimiseResult(), rankings: [], preview: true, locale: 'en-GB' },
    });
    expect(screen.getByText('Machines of the baseline fleet')).toBeTruthy();
    // the optimiser's fleet differs from the assessed baseline, and the report says so
    expect(screen.getByText(/it is not the fleet assessed here/)).toBeTruthy();
    expect(screen.getByText(/Saving over the best-buy-first fleet:/).textContent).toContain(
      'Saving over the best-buy-first fleet: £2,000.',
    );
    expect(screen.getByRole('img', { name: /fleet cost against worst-case level/ })).toBeTruthy();
  });

  it('Report (preview) says how sure compliance is: every limit at once with its draws and seed, each cell, the model and the caution', () => {
    const project = smallProject();
    const { container } = render(Report, {
      props: { project, evaluation: evaluateProject(project), preview: true, locale: 'en-GB' },
    });
    const section = container.querySelector('[data-testid="report-confidence"]');
    expect(section?.querySelector('h2')?.textContent).toBe('How sure is compliance');
    expect(section?.textContent).toMatch(/Every limit met at once: .*\(Monte Carlo, 10,000 draws, seed 1;/);
    expect(section?.textContent).toMatch(/σ = K \/ 1.645/);
    expect(section?.textContent).toMatch(/competent acoustician and the local authority decide/);
    expect(section?.querySelectorAll('tbody tr').length).toBeGreaterThan(0);
  });

  it('Report (preview) has a per-receiver table: each receiver’s least margin, where, and the loudest machine there', () => {
    const project = smallProject();
    const evaluation = evaluateProject(project);
    const { container } = render(Report, { props: { project, evaluation, preview: true, locale: 'en-GB' } });
    const table = container.querySelector('[data-testid="report-receivers"] table');
    const rows = [...(table?.querySelectorAll('tbody tr') ?? [])];
    expect(rows.length).toBe(project.receivers.length);
    for (const [i, r] of project.receivers.entries()) {
      const cells = [...rows[i]!.children].map((c) => c.textContent?.replace(/\s+/g, ' ').trim() ?? '');
      expect(cells[0]).toContain(r.name);
      // the margin shown is the least of this receiver's limited cells in the evaluation (the ledger's matrix)
      const margins = evaluation.matrix
        .filter((c) => c.receiverId === r.id && c.marginDb !== undefined)
        .map((c) => c.marginDb!);
      if (margins.length) expect(cells[4]).toContain(Math.abs(Math.min(...margins)).toFixed(1));
    }
    // the answer first: the statement, then the per-receiver table, then the shortlist
    const order = screen.getAllByRole('heading', { level: 2 }).map((h) => h.textContent ?? '');
    expect(order.indexOf('Receiver by receiver')).toBeLessThan(order.indexOf('Shortlist'));
  });

  it('Report (preview) reads a duty whose only machine is its baseline as such, not as a ranking of zero reductions', () => {
    const project = smallProject();
    // an invented third duty in the Groundworks phase with one machine, its baseline
    project.duties.push({ ...project.duties[1]!, id: 'pump', name: 'Pumping', baselineCandidateId: 'p1' });
    project.candidates.push({
      ...project.candidates[2]!,
      id: 'p1',
      dutyId: 'pump',
      label: 'Site pump 3 kW',
      lwaDb: 93,
    });
    render(Report, { props: { project, evaluation: evaluateProject(project), preview: true, locale: 'en-GB' } });
    const heading = screen.getByRole('heading', { name: /^Ranking: Pumping at / });
    const section = heading.closest('section')!;
    expect(section.querySelector('[data-testid="only-baseline"]')?.textContent).toMatch(
      /Site pump 3 kW is the only machine offered for this duty, and so its baseline: there is nothing\s+to rank it against/,
    );
    expect(section.querySelector('table')).toBeNull();
    expect(section.textContent).not.toMatch(/0\.0 dB|a dB|£/);
    // the other duties are still ranked in tables
    const digging = screen.getByRole('heading', { name: /^Ranking: Digging at / }).closest('section')!;
    expect(digging.querySelector('table')).not.toBeNull();
  });

  it('Report of a new, empty project says what is still missing and where, and prints no empty table', () => {
    const project = blankProject('Larkspur Mews extension');
    const { container } = render(Report, {
      props: { project, evaluation: evaluateProject(project), preview: true, locale: 'en-GB' },
    });
    const missing = screen.getByTestId('missing');
    expect(missing.textContent).toMatch(/No receiver yet: .*\(tab Receivers\)/);
    expect(missing.textContent).toMatch(/No machine offered for “Duty 1”.*\(tab Machines\)/);
    expect(missing.textContent).toContain('No level at a receiver can be predicted yet');
    // paper has no buttons to press
    expect(missing.querySelector('button')).toBeNull();
    expect(container.querySelector('table')).toBeNull();
    const headings = screen.getAllByRole('heading', { level: 2 }).map((h) => h.textContent ?? '');
    expect(headings).not.toContain('Predicted levels with the baseline fleet');
    expect(headings.some((h) => h.startsWith('Compliance statement'))).toBe(false);
    expect(headings).toContain('Method');
    expect(screen.getByText(/ISO 9613-2 quotes an accuracy of about ±3 dB/)).toBeTruthy();
  });

  it('Report of a project that lacks a limit at one receiver lists it first and still prints the levels worked out', () => {
    const project = smallProject();
    const [first, ...rest] = project.receivers;
    project.receivers = [{ ...first!, limitsDb: {} }, ...rest];
    render(Report, { props: { project, evaluation: evaluateProject(project), preview: true, locale: 'en-GB' } });
    const missing = screen.getByTestId('missing');
    expect(missing.textContent).toContain(`No limit for a period a phase is assessed over at “${first!.name}”`);
    expect(missing.textContent).not.toContain('No level at a receiver can be predicted yet');
    expect(screen.getByRole('heading', { name: 'Predicted levels with the baseline fleet' })).toBeTruthy();
    const order = screen.getAllByRole('heading', { level: 2 }).map((h) => h.textContent ?? '');
    expect(order[0]).toBe('Still missing before results can be computed');
  });
});
