import { describe, expect, it } from 'vitest';
import { render } from '@testing-library/svelte';
import Grid from '../../../src/app/grid/Grid.svelte';
import { gridProps, dutyGroups } from './fixture.ts';

describe('smoke', () => {
  it('renders', async () => {
    const r = render(Grid, { props: gridProps({ group: dutyGroups }) });
    await new Promise((res) => setTimeout(res, 20));
    console.log(r.container.innerHTML.slice(0, 3000));
  });
});
