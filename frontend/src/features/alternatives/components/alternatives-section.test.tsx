import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { AdoptAlternativeResult, Alternative } from '../../../api/types';
import { demoHouseB } from '../../../test/estimate-fixtures';
import { requestPath } from '../../../test/fake-api';
import { renderWithProviders } from '../../../test/render-with-providers';
import { AlternativesSection } from './alternatives-section';

const HOUSE_ID = demoHouseB.id;

function alternative(id: number, name: string, changes: Partial<Alternative>): Alternative {
  return {
    id,
    houseId: HOUSE_ID,
    name,
    notes: null,
    patch: {},
    changedFields: [],
    calendar: null,
    costAmount: null,
    createdById: 3,
    createdByName: 'Ada Adviser',
    invalid: null,
    house: demoHouseB,
    createdAt: '2026-12-01T10:00:00.000Z',
    updatedAt: '2026-12-01T10:00:00.000Z',
    ...changes,
  };
}

const doublePoly = alternative(11, 'Inflated double poly', {
  patch: { coverings: { roof: 'poly-double-inflated', sidewalls: 'poly-double-inflated' } },
  changedFields: ['coverings.roof', 'coverings.sidewalls'],
  costAmount: 4200,
});
const lowRidge = alternative(12, 'Lower ridge', {
  patch: { ridgeHeightM: 1 },
  changedFields: ['ridgeHeightM'],
  invalid: { field: 'ridgeHeightM', message: 'The ridge must be higher than the eave' },
  house: null,
});

type Call = { method: string; url: string };

/** The API as the section uses it: the list, delete and adopt; every call is recorded. */
function stubApi(initial: Alternative[]) {
  let list = [...initial];
  const calls: Call[] = [];
  const adopted: AdoptAlternativeResult = { house: { ...demoHouseB, version: 2 }, previous: doublePoly };
  vi.stubGlobal(
    'fetch',
    vi.fn(async (request: Request) => {
      const { method } = request;
      const url = requestPath(request);
      calls.push({ method, url });
      const json = (body: unknown) =>
        new Response(JSON.stringify(body), { status: 200, headers: { 'Content-Type': 'application/json' } });
      if (method === 'GET' && url === `/api/houses/${HOUSE_ID}/alternatives`) return json(list);
      const deleted = /^\/api\/alternatives\/(\d+)$/.exec(url);
      if (method === 'DELETE' && deleted) {
        list = list.filter((alt) => alt.id !== Number(deleted[1]));
        return new Response(null, { status: 204 });
      }
      if (method === 'POST' && url === `/api/alternatives/${doublePoly.id}/adopt`) return json(adopted);
      return new Response(JSON.stringify({ statusCode: 404, message: 'not stubbed' }), { status: 404 });
    }),
  );
  return { calls, adopted };
}

function renderSection(rights: { canWrite: boolean; canAdopt: boolean; canRun: boolean }) {
  const onAdopted = vi.fn();
  renderWithProviders(<AlternativesSection houseId={HOUSE_ID} currency="USD" onAdopted={onAdopted} {...rights} />);
  return { onAdopted, section: screen.getByRole('region', { name: 'Alternatives' }) };
}

const ALL_RIGHTS = { canWrite: true, canAdopt: true, canRun: true };

afterEach(() => vi.unstubAllGlobals());

describe('AlternativesSection', () => {
  it('lists each alternative with what it changes, its cost and author; an invalid one is marked and not offered', async () => {
    stubApi([doublePoly, lowRidge]);
    const { section } = renderSection(ALL_RIGHTS);
    const items = await within(section).findAllByRole('listitem');
    expect(items).toHaveLength(2);
    const [valid, invalid] = items;

    expect(valid.textContent).toContain('Inflated double poly');
    expect(valid.textContent).toContain('Changes roof covering, sidewall covering');
    expect(valid.textContent).toContain('cost $4,200'); // the farm's currency (USD here)
    expect(valid.textContent).toContain('by Ada Adviser');
    expect(within(valid).getByRole('link', { name: 'Season' }).getAttribute('href')).toBe(
      `/houses/${HOUSE_ID}/season?alternative=${doublePoly.id}`,
    );
    expect(within(valid).getByRole('button', { name: 'Make this the house' })).toBeTruthy();

    expect(invalid.textContent).toContain('no cost entered');
    expect(within(invalid).getByText('Invalid now: ridgeHeightM')).toBeTruthy();
    expect(within(invalid).queryByRole('link', { name: 'Season' })).toBeNull();
    expect(within(invalid).queryByRole('button', { name: 'Make this the house' })).toBeNull();
    expect(within(invalid).getByRole('button', { name: 'Delete' })).toBeTruthy();
    expect(within(section).getByText(/no longer makes a valid house/)).toBeTruthy();

    expect(within(section).getByRole('link', { name: 'Compare side by side →' }).getAttribute('href')).toBe(
      `/houses/${HOUSE_ID}/side-by-side?alternatives=${doublePoly.id},${lowRidge.id}`,
    );
  });

  it('puts at most the four newest alternatives side by side', async () => {
    stubApi([1, 2, 3, 4, 5].map((n) => alternative(n, `Try ${n}`, {})));
    const { section } = renderSection(ALL_RIGHTS);
    const link = await within(section).findByRole('link', { name: 'Compare side by side →' });
    expect(link.getAttribute('href')).toBe(`/houses/${HOUSE_ID}/side-by-side?alternatives=2,3,4,5`);
  });

  it('deletes an alternative after asking, and lists what is left', async () => {
    const user = userEvent.setup();
    const { calls } = stubApi([doublePoly, lowRidge]);
    const { section } = renderSection(ALL_RIGHTS);
    const invalid = (await within(section).findAllByRole('listitem'))[1];
    await user.click(within(invalid).getByRole('button', { name: 'Delete' }));
    const dialog = screen.getByRole('dialog', { name: 'Delete “Lower ridge”?' });
    expect(calls.filter((call) => call.method === 'DELETE')).toEqual([]);
    await user.click(within(dialog).getByRole('button', { name: 'Delete alternative' }));
    await waitFor(() => expect(within(section).getAllByRole('listitem')).toHaveLength(1));
    expect(calls.filter((call) => call.method === 'DELETE')).toEqual([
      { method: 'DELETE', url: `/api/alternatives/${lowRidge.id}` },
    ]);
    expect(within(section).queryByText(/no longer makes a valid house/)).toBeNull();
  });

  it('makes an alternative the house after asking, and hands the result to the page', async () => {
    const user = userEvent.setup();
    const { calls, adopted } = stubApi([doublePoly]);
    const { section, onAdopted } = renderSection(ALL_RIGHTS);
    await user.click(await within(section).findByRole('button', { name: 'Make this the house' }));
    const dialog = screen.getByRole('dialog', { name: 'Make “Inflated double poly” the house?' });
    expect(dialog.textContent).toContain('kept as an alternative');
    await user.click(within(dialog).getByRole('button', { name: 'Make this the house' }));
    await waitFor(() => expect(onAdopted).toHaveBeenCalledOnce());
    expect(onAdopted.mock.calls[0][0]).toEqual(adopted);
    expect(calls).toContainEqual({ method: 'POST', url: `/api/alternatives/${doublePoly.id}/adopt` });
  });

  it('a viewer reads the list without any action', async () => {
    stubApi([doublePoly]);
    const { section } = renderSection({ canWrite: false, canAdopt: false, canRun: false });
    await within(section).findByText('Inflated double poly');
    expect(within(section).queryAllByRole('button')).toEqual([]);
    expect(within(section).queryAllByRole('link')).toEqual([]);
  });

  it('an adviser (alternative:write without house:write) may delete but not make one the house', async () => {
    stubApi([doublePoly]);
    const { section } = renderSection({ canWrite: true, canAdopt: false, canRun: true });
    await within(section).findByText('Inflated double poly');
    expect(within(section).getByRole('button', { name: 'Delete' })).toBeTruthy();
    expect(within(section).queryByRole('button', { name: 'Make this the house' })).toBeNull();
  });

  it('says how to make one when there is none', async () => {
    stubApi([]);
    const { section } = renderSection(ALL_RIGHTS);
    await within(section).findByText(/None yet/);
    expect(within(section).queryByRole('link', { name: 'Compare side by side →' })).toBeNull();
  });

  it('shows why the list could not be loaded', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(
        async () =>
          new Response(JSON.stringify({ statusCode: 404, error: 'Not Found', message: 'House not found' }), {
            status: 404,
            headers: { 'Content-Type': 'application/json' },
          }),
      ),
    );
    const { section } = renderSection(ALL_RIGHTS);
    const alert = await within(section).findByRole('alert');
    expect(alert.textContent).toContain('Alternatives could not be loaded');
    expect(alert.textContent).toContain('House not found');
  });
});
