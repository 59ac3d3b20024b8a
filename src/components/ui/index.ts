export { Button, buttonClass } from './button';
export { LinkButton } from './link-button';
export { TextField, SelectField, TextAreaField } from './field';
export { Card, PageHeader, Stat } from './card';
export { Loading, ErrorState, EmptyState, Caution } from './states';
export { Table, Th, Td } from './table';
export { Dialog } from './dialog';
export { ToastProvider, useToast } from './toast';
export { cx } from './cx';
export { FormBanner } from './form-banner';
export { SuggestionChip } from './suggestion-chip';
// PasswordHint, TimeZoneOptions and QuantityField are imported by path: they pull in form and unit code
// that the initial page (sign-in, app shell) must not load.
