/** Types of icon-names.cjs (the collection rule is described there). */
export interface IconNames {
  /** Icon name → the files (relative to the folder searched) that use it, sorted by name. */
  readonly names: Map<string, Set<string>>;
  /** <mat-icon> bindings that neither name an icon nor read one through something named *icon*. */
  readonly unnamedBindings: string[];
}
export function collectIconNames(projectsDir: string): IconNames;
export function fromTemplate(text: string, found: Map<string, Set<string>>, unnamed: string[], where: string): void;
export function fromTypeScript(text: string, found: Map<string, Set<string>>, unnamed: string[], where: string): void;
