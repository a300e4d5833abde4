/** Expecting a query module to refuse: the DomainError it throws, for checking its code and fields. */
import { DomainError } from "../../db/domainError";

/**
 * The DomainError the call fails with; succeeding, or failing any other way,
 * fails the test.
 *
 * @example
 * expect((await domainFailure(getSession(db, stranger, id))).code).toBe("not_found");
 */
export async function domainFailure(p: Promise<unknown>): Promise<DomainError> {
  try {
    await p;
  } catch (err) {
    if (err instanceof DomainError) return err;
    throw err;
  }
  throw new Error("expected the call to fail");
}
