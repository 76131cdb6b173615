/** Limits shared by forms and the server, so both refuse the same input. */
export const LIMITS = {
  nameMax: 120,
  emailMax: 254,
  passwordMin: 10,
  passwordMax: 256,
  groupNameMax: 120,
  notebookTitleMax: 200,
  notebookDescriptionMax: 2000,
} as const;
