import { DomainError } from '../errors/domain-error';
import { requirePositiveNumber, requireWholeNumber } from '../errors/require';
import { inchesToCm } from '../units/length';
import { PANEL_HEIGHT_IN, PANEL_WIDTH_IN } from './panel';

/** A blanket's layout in panels: `columns` panels across, `rows` panels down. */
export interface BlanketGrid {
  columns: number;
  rows: number;
}

export interface FinishedSize {
  widthIn: number;
  heightIn: number;
  widthCm: number;
  heightCm: number;
}

export interface StockYield {
  blankets: number;
  panelsLeftOver: number;
}

/** An agency's ask: this many blankets of this grid. */
export interface BlanketRequest {
  grid: BlanketGrid;
  blankets: number;
}

export interface Shortfall {
  panelsNeeded: number;
  panelsInStock: number;
  /** Panels still to collect; 0 when stock covers every request. */
  panelsShort: number;
  /** Panels left once every request is met; 0 when stock falls short. */
  panelsSurplus: number;
}

function requireGrid(grid: BlanketGrid, argument = 'grid'): BlanketGrid {
  if (typeof grid !== 'object' || grid === null) {
    throw new DomainError(argument, `${argument} must be an object with columns and rows.`);
  }
  // A grid needs at least one panel each way; zero would also make stock division meaningless.
  requireWholeNumber(`${argument}.columns`, grid.columns, 1);
  requireWholeNumber(`${argument}.rows`, grid.rows, 1);
  return grid;
}

export function panelsPerBlanket(grid: BlanketGrid): number {
  requireGrid(grid);
  return grid.columns * grid.rows;
}

// Seams and any border are ignored: sewn panels lose a little at each seam, and edgings add a
// little back, so the panel multiple is the size the catalogue quotes.
export function finishedSize(grid: BlanketGrid): FinishedSize {
  requireGrid(grid);
  const widthIn = grid.columns * PANEL_WIDTH_IN;
  const heightIn = grid.rows * PANEL_HEIGHT_IN;
  return { widthIn, heightIn, widthCm: inchesToCm(widthIn), heightCm: inchesToCm(heightIn) };
}

export function blanketsFromStock(panelsInStock: number, grid: BlanketGrid): StockYield {
  requireWholeNumber('panelsInStock', panelsInStock);
  const perBlanket = panelsPerBlanket(grid);
  const blankets = Math.floor(panelsInStock / perBlanket);
  return { blankets, panelsLeftOver: panelsInStock - blankets * perBlanket };
}

export function panelsForRequests(requests: readonly BlanketRequest[]): number {
  // Typed callers always pass a list; the check guards values that arrive from JSON.
  const list: unknown = requests;
  if (!Array.isArray(list)) {
    throw new DomainError('requests', 'requests must be a list of { grid, blankets }.');
  }
  return requests.reduce((total, request, index) => {
    requireGrid(request.grid, `requests[${index}].grid`);
    requireWholeNumber(`requests[${index}].blankets`, request.blankets);
    return total + request.grid.columns * request.grid.rows * request.blankets;
  }, 0);
}

export function shortfall(panelsInStock: number, requests: readonly BlanketRequest[]): Shortfall {
  requireWholeNumber('panelsInStock', panelsInStock);
  const panelsNeeded = panelsForRequests(requests);
  return {
    panelsNeeded,
    panelsInStock,
    panelsShort: Math.max(0, panelsNeeded - panelsInStock),
    panelsSurplus: Math.max(0, panelsInStock - panelsNeeded),
  };
}

// The panel count along one side whose length comes closest to the target; on a tie (target
// exactly halfway) the smaller count, since it takes fewer panels.
function closestPanelCount(targetIn: number, panelIn: number): number {
  const fewer = Math.max(1, Math.floor(targetIn / panelIn));
  const more = fewer + 1;
  return Math.abs(more * panelIn - targetIn) < Math.abs(fewer * panelIn - targetIn) ? more : fewer;
}

/**
 * The grid whose finished size is closest to a target size, measured as the sum of the absolute
 * width and height differences; ties go to the grid with fewer panels. Because the sum separates
 * into a width term and a height term, choosing the closest count on each side independently
 * gives the overall minimum.
 */
export function closestGrid(targetWidthIn: number, targetHeightIn: number): BlanketGrid {
  requirePositiveNumber('targetWidthIn', targetWidthIn);
  requirePositiveNumber('targetHeightIn', targetHeightIn);
  return {
    columns: closestPanelCount(targetWidthIn, PANEL_WIDTH_IN),
    rows: closestPanelCount(targetHeightIn, PANEL_HEIGHT_IN),
  };
}
