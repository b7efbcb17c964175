/** What a tool command (`init`, `refit`, `explain`) printed: standard output, standard error and the exit status. */
export interface CommandOutcome {
  stdout: string;
  stderr: string;
  status: 0 | 1 | 2;
}
