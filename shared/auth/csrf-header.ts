/** Header that carries the CSRF token on POST, PUT, PATCH and DELETE. */
export const csrfHeaderName = 'x-csrf-token';
