import { type ApiHandler, mustFind, render } from './context';
import { paginate } from './list';
import { arr, checkParams, EXPAND, LIST_PARAMS, str } from './params';
import { StripeFakeError } from './stripe-error';

export const retrieveEvent: ApiHandler = ({ state, params, path }) => {
  const p = checkParams(params, { expand: EXPAND }) as { expand?: string[] };
  return render(state, mustFind(state.events, path.id, 'event'), p.expand);
};

/** `type` may end in `.*` (e.g. `charge.*`), as in Stripe's list filter. */
function typeMatches(pattern: string, type: string): boolean {
  return pattern.endsWith('.*') ? type.startsWith(pattern.slice(0, -1)) : pattern === type;
}

export const listEvents: ApiHandler = ({ state, params }) => {
  const p = checkParams(params, { ...LIST_PARAMS, type: str(), types: arr(str(), { maxItems: 20 }) }) as {
    type?: string;
    types?: string[];
    expand?: string[];
  };
  if (p.type !== undefined && p.types !== undefined) {
    throw StripeFakeError.invalidRequest('You may only specify one of these parameters: type, types.');
  }
  const patterns = p.types ?? (p.type !== undefined ? [p.type] : undefined);
  const items = [...state.events.values()].filter((e) => !patterns || patterns.some((pattern) => typeMatches(pattern, e.type)));
  return render(state, paginate(items, p, '/v1/events', 'event'), p.expand);
};
