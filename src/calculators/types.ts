/**
 * The calculator definition: one object per calculator drives the page widget, the CLI, the
 * verification cases, the print sheet and the tests. Defaults are written once, here.
 */
import type { Provenance, SourceRef } from '../core/sources/index.ts';
import type { QuantityKind } from '../core/units/index.ts';

/** A choice input holding one of these values. */
export interface Condition {
  readonly key: string;
  readonly is: readonly string[];
}

export interface NumberInput {
  readonly key: string;
  readonly label: string;
  readonly kind: QuantityKind;
  /** Default in SI; the page pre-fills it. */
  readonly default: number;
  readonly min: number;
  readonly max: number;
  readonly minExclusive?: boolean | undefined;
  readonly maxExclusive?: boolean | undefined;
  readonly help: string;
  /** When true the CLI and evaluate() refuse to fill the default (it is a design quantity). */
  readonly required?: boolean;
  /** When true the input may be left empty: compute receives undefined. */
  readonly optional?: boolean;
  /** Only shown when another (choice) input has one of these values. */
  readonly when?: Condition;
  /** A second condition: the input applies only when both hold (see `onlyWhen`). */
  readonly alsoWhen?: Condition;
}

export interface ChoiceOption<V extends string = string> {
  readonly value: V;
  readonly label: string;
}

export interface ChoiceInput<V extends string = string> {
  readonly key: string;
  readonly label: string;
  readonly kind: 'choice';
  readonly options: readonly ChoiceOption<V>[];
  readonly default: V;
  readonly help: string;
  readonly required?: boolean;
  readonly when?: Condition;
  /** A second condition: the input applies only when both hold (see `onlyWhen`). */
  readonly alsoWhen?: Condition;
}

/**
 * Free text such as a pasted CSV record. The page shows a text area with a file picker; the CLI
 * takes `--in key=@file.csv`. The value is untrusted: compute must parse it defensively and throw
 * an InputRangeError (naming the row) for malformed data.
 */
export interface TextInput {
  readonly key: string;
  readonly label: string;
  readonly kind: 'text';
  readonly default: string;
  /** Largest accepted length in characters (protects the page from huge pastes). */
  readonly maxLength: number;
  readonly help: string;
  readonly rows?: number;
  readonly required?: boolean;
  readonly when?: Condition;
  /** A second condition: the input applies only when both hold (see `onlyWhen`). */
  readonly alsoWhen?: Condition;
  /**
   * When true the page fills this input from its address (`?key=…`, as a feed link from another
   * page does), through the same checks as typing, shown as text. Keep maxLength small (a few
   * thousand characters) for such inputs. Without it text in the address is ignored.
   */
  readonly fromUrl?: boolean;
}

export type InputDef = NumberInput | ChoiceInput | TextInput;

export interface OutputDef {
  readonly key: string;
  readonly label: string;
  /** A quantity kind, or 'text' for category outputs such as the damping regime. */
  readonly kind: QuantityKind | 'text';
  readonly help?: string;
  /** Significant digits shown (default 4). */
  readonly digits?: number;
  /** True when the output is absent for some inputs (e.g. log decrement above critical damping). */
  readonly optional?: boolean;
  /**
   * Pages whose calculator takes this output as an input: the widget shows a link that opens
   * that page with the value filled in (e.g. a duty page's mean power → the thermal pages).
   */
  readonly feeds?: readonly FeedDef[];
}

/**
 * A link from an output to another page's calculator (the query is built by feedQuery in feeds.ts).
 * `input` receives this output's value; `with` fills more target inputs from this calculator
 * (target key → a key of this calculator's outputs, inputs or hand-offs, looked up in that order);
 * `set` fills target inputs with constants (e.g. a choice value). The link is hidden while any
 * source is absent.
 */
export interface FeedDef {
  readonly page: string;
  readonly input: string;
  readonly label: string;
  readonly with?: Readonly<Record<string, string>>;
  readonly set?: Readonly<Record<string, string>>;
}

/**
 * A value compute hands to other pages but does not display (e.g. a power profile as text for
 * the warm-up page). Declared so feeds can be checked and evaluate() can bound it.
 */
export interface HandoffDef {
  readonly key: string;
  readonly help: string;
  /** Longest value in characters; evaluate() refuses a longer one. */
  readonly maxLength: number;
}

/** Values handed to compute: SI numbers, or the chosen option of a choice input. */
export type Values = Readonly<Record<string, number | string | undefined>>;
export type Outputs = Record<string, number | string | undefined>;

/** A chart as data: drawn by the chart element, summarised as text for print and screen readers. */
export interface ChartSpec {
  readonly id: string;
  readonly title: string;
  readonly x: ChartAxis;
  readonly y: ChartAxis;
  readonly series: readonly ChartSeries[];
  /** Vertical reference lines (e.g. r = √2); `operating` marks the current input value (see ChartAxis.input). */
  readonly markers?: readonly ChartMarker[];
  /** One or two sentences that state what the chart shows, with the key numbers. */
  readonly summary: string;
}

export interface ChartMarker {
  readonly x: number;
  readonly label: string;
  /** The current operating point: drawn stronger and labelled with its value in the reader's unit. */
  readonly operating?: boolean;
}

export interface ChartAxis {
  readonly label: string;
  /**
   * Key of the calculator input this (x) axis shows: the chart then marks that input's current
   * value as the operating point (src/calculators/chartMarks.ts adds the marker for every renderer).
   */
  readonly input?: string;
  /** Data are SI; the renderer converts to the reader's unit system. */
  readonly kind: QuantityKind;
  readonly scale?: 'linear' | 'log';
  readonly min?: number;
  readonly max?: number;
}

export interface ChartSeries {
  readonly label: string;
  readonly x: readonly number[];
  readonly y: readonly number[];
  readonly style?: 'line' | 'dash' | 'points' | 'thin';
  /** Palette slot 0..7: a colour and a dash pattern (src/components/render/palette.ts). */
  readonly tone?: number;
  /** false: drawn but not listed in the legend (e.g. the mirror half of an envelope). */
  readonly legend?: false;
}

export interface Result {
  readonly outputs: Outputs;
  /** Validity warnings (e.g. a correlation used outside its range). Shown beside the results. */
  readonly warnings: readonly string[];
  /** Hand-off strings for feeds (declared in `handoffs`); never displayed. */
  readonly handoff?: Readonly<Record<string, string>>;
}

export interface VerificationCase {
  readonly name: string;
  readonly inputs: Values;
  readonly expected: Readonly<Record<string, number | string>>;
  /** Relative tolerance for numbers (absolute when the expected value is 0). */
  readonly tolerance: number;
  readonly why: string;
  readonly source: SourceRef;
  readonly provenance: Provenance;
}

export interface CalculatorDefinition {
  readonly id: string;
  readonly title: string;
  readonly summary: string;
  readonly inputs: readonly InputDef[];
  readonly outputs: readonly OutputDef[];
  /** Pure: validated SI values in, SI outputs out. */
  compute(values: Values): Result;
  /** Pure: chart data from the same values (called only where charts are drawn). */
  charts?(values: Values, result: Result): ChartSpec[];
  readonly verification: readonly VerificationCase[];
  readonly sources: readonly SourceRef[];
  /** Hand-off values compute may return in `Result.handoff` (see HandoffDef). */
  readonly handoffs?: readonly HandoffDef[];
  /** Study vocabulary: inputs that take a study quantity, outputs that publish one (see StudyBindings). */
  readonly study?: StudyBindings;
  /**
   * Set when `evaluate` plus `charts` can take longer than one frame (16 ms) for some valid inputs
   * (`npm run bench` lists each calculator's p99 and flags any over a frame without this): the page
   * then computes it in a module worker (src/components/client/off-thread.ts) so typing never waits
   * for it. Same definition and core either way; the CLI and tests are unaffected.
   */
  readonly offMainThread?: true;
}

/**
 * How a calculator joins a study (src/studies/): `inputs` maps an input key to the study quantity
 * it takes, `publishes` maps an output key to the study quantity it sets for later steps. Names
 * come from src/studies/quantities.ts; a quantity name means one physical thing in one kind.
 */
export interface StudyBindings {
  readonly inputs?: Readonly<Record<string, string>>;
  readonly publishes?: Readonly<Record<string, string>>;
  /**
   * Refuses a step whose bound inputs do not mean their study quantity under the step's other
   * inputs (e.g. warm-up's P is the power while on: the study's mean power only at duty 1).
   * `bound` holds the input keys filled from the study or an earlier step; returns the reason.
   */
  readonly refuse?: (values: Values, bound: ReadonlySet<string>) => string | undefined;
}

/** Identity with checking: keeps the literal types and catches typos in keys at compile time. */
export function defineCalculator<const D extends CalculatorDefinition>(def: D): D {
  return def;
}

/**
 * Adds a condition to a group of inputs (e.g. a shared damper-law block that applies only when
 * the force is not measured): an input without `when` takes it as its `when`, one with a `when`
 * as its `alsoWhen`. General: the widget, the sheet, the CLI and evaluate() read both through
 * `isActive`.
 */
export function onlyWhen(cond: Condition, inputs: readonly InputDef[]): InputDef[] {
  return inputs.map((d) => {
    if (!d.when) return { ...d, when: cond };
    if (d.alsoWhen) throw new TypeError(`calculator bug: '${d.key}' already has two conditions`);
    return { ...d, alsoWhen: cond };
  });
}

/** Reads a number input the definition guarantees is present. */
export function num(values: Values, key: string): number {
  const v = values[key];
  if (typeof v !== 'number') throw new TypeError(`calculator bug: '${key}' is not a number`);
  return v;
}

/** Reads an optional number input. */
export function optNum(values: Values, key: string): number | undefined {
  const v = values[key];
  return typeof v === 'number' ? v : undefined;
}

/** Reads a text input. */
export function text(values: Values, key: string): string {
  const v = values[key];
  if (typeof v !== 'string') throw new TypeError(`calculator bug: '${key}' is not text`);
  return v;
}

/** Reads a choice input. */
export function choice<V extends string>(values: Values, key: string): V {
  const v = values[key];
  if (typeof v !== 'string') throw new TypeError(`calculator bug: '${key}' is not a choice`);
  return v as V;
}
