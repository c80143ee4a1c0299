/** Test-side call of an operation through the dispatcher every transport uses. */
import type { ServiceContext } from '../../electron/services/context';
import { dispatch } from '../../electron/services/dispatch';

/** The operation's value; an error answer throws, naming the operation and the message. */
export async function dispatchValue<T>(context: ServiceContext, name: string, input: unknown): Promise<T> {
  const result = await dispatch(context, name, input);
  if (!result.ok) throw new Error(`${name}: ${result.error.message}`);
  return result.value as T;
}
