/**
 * Remembers the last result of `compute` and returns it again while every argument is the same
 * (compared with Object.is), so a panel recomputes its geometry only when its inputs change.
 */
export function memoLast<A extends readonly unknown[], R>(compute: (...args: A) => R): (...args: A) => R {
  let last: { readonly args: A; readonly result: R } | undefined;
  return (...args: A): R => {
    if (last !== undefined && last.args.length === args.length && last.args.every((a, i) => Object.is(a, args[i]))) return last.result;
    last = { args, result: compute(...args) };
    return last.result;
  };
}
