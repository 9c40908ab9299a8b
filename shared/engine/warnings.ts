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
    | 'unsymmetric-section'
    | 'frame-racking';
  /** `error` where the design does not stand as drawn (a module tips off); warnings otherwise. */
  severity?: 'error';
  message: string;
  /** The member or module to highlight; never shown in the message, which names things as the builder does. */
  member_id?: string;
  /** Every member the message names, when it names more than one. */
  member_ids?: string[];
  module_id?: string;
};
