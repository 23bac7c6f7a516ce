/** The branch a detail view is about. */
export class CompareBranchView {
  id: string;
  name: string;
  /** IANA time zone: the branch's business dates are its own calendar days. */
  timeZone: string;
  currency: string;
}
