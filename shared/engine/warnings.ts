/** Something the builder should look at; never fatal. Codes are stable, messages are for people. */
export type ReportWarning = {
  code:
    | 'free-end-with-joint-method'
    | 'joint-method-not-for-joints'
    | 'through-not-possible'
    | 'inline-one-sided'
    | 'end-shared'
    | 'plain-section-fastener'
    | 'module-unsupported'
    | 'module-clash'
    | 'member-unsupported'
    | 'load-cycle'
    | 'over-utilised'
    | 'slot-closed'
    | 'module-tips'
    | 'module-held-down'
    | 'module-one-member'
    | 'cantilever-joint'
    | 'member-isolated'
    | 'member-duplicate'
    | 'column-over-utilised'
    | 'unsymmetric-section';
  /** `error` where the design does not stand as drawn (a module tips off); warnings otherwise. */
  severity?: 'error';
  message: string;
  member_id?: string;
  module_id?: string;
};
