export const ATTEMPTS_PER_PROBLEM = 3;
export const MAX_ANSWER_LENGTH = 60;
