// A few entries of the product's own common-password list, for tests that need known-refused passwords.
export const COMMON_PASSWORDS_FOR_TESTS = ['password1234', 'qwerty123456', '123456789012', 'polecourt-demo'];
