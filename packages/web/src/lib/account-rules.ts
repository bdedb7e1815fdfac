/** Limits the server's DTOs enforce on accounts; forms check them first so the user hears early. */
export const PASSWORD_MIN_LENGTH = 10;
export const PASSWORD_MAX_LENGTH = 200;
export const NAME_MAX_LENGTH = 120;
