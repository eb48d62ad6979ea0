import { Signal, computed } from '@angular/core';
import { toProblem } from '../../core/errors/problem';

/** The words to show when a resource could not load, or null while it has not failed. */
export function loadMessage(resource: { error(): unknown }): Signal<string | null> {
  return computed(() => {
    const error = resource.error();
    return error ? toProblem(error).title : null;
  });
}
