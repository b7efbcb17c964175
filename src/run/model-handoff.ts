/**
 * How a model's outcome is handed over once it is final, when the run does not keep it whole:
 * rendered on the thread that evaluated it (a worker thread too) into the small copy the Result
 * keeps and the model's report text, then taken on the main thread (which sets the text aside,
 * entries/model-spool.ts). Rendering where the model ran spreads that work over the threads, and
 * only the copy and the text's bytes cross between them instead of the outcome's whole object graph.
 *
 * A worker thread cannot receive a function, so a render is found by name: the module that defines
 * it registers it when it loads, on every thread that loads it (the CLI bundle is one file, which
 * its workers load whole). A thread where the name is not registered sends the outcome whole and
 * the main thread renders it.
 */
import type { ModelResult } from '../result/result.js';

/** A model's outcome rendered for the main thread: what the Result keeps, and the report text. */
export interface RenderedModel {
  /** What the Result keeps of the model (a small copy). */
  kept: ModelResult;
  /** The model's part of the report, as UTF-8 bytes. */
  text: Uint8Array;
}

/** Renders one model's outcome; must give the same on every thread. */
export type ModelRender = (model: ModelResult) => RenderedModel;

/** The handover a run asks for: the render's registered name and what the main thread does with its output. */
export interface ModelHandoff {
  /** Name of a render registered with {@link registerModelRender}. */
  render: string;
  /** On the main thread: sets the text aside and returns what the Result keeps. */
  take(rendered: RenderedModel): ModelResult;
}

const renders = new Map<string, ModelRender>();

/**
 * Registers a render under a name, on this thread (call it at the top level of the module that
 * defines the render, so that every thread that loads the module has it). A second registration
 * of the same name replaces the first.
 */
export function registerModelRender(name: string, render: ModelRender): void {
  renders.set(name, render);
}

/** The render registered under `name` on this thread, or undefined. */
export function modelRender(name: string): ModelRender | undefined {
  return renders.get(name);
}

/**
 * What the main thread does with a whole outcome: the handoff's render and take when the render is
 * registered here, else `onModel`, else nothing (the Result keeps the outcome whole).
 * @param handoff the run's handoff, if any
 * @param onModel the run's callback for whole outcomes, if any
 */
export function wholeModelKeeper(
  handoff?: ModelHandoff,
  onModel?: (model: ModelResult) => ModelResult,
): (model: ModelResult) => ModelResult {
  const render = handoff === undefined ? undefined : modelRender(handoff.render);
  if (handoff !== undefined && render !== undefined) return (model) => handoff.take(render(model));
  return onModel ?? ((model) => model);
}
