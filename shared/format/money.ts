// Money as the product shows it: US English, in the shop's currency (US dollars; the product has no
// currency setting). One formatter for the browser and the server.
import { round2 } from '../calc/round';

/** the currency every price in the catalogue, bill of materials and change report is in */
export const SHOP_CURRENCY = 'USD';

const WITH_SYMBOL = new Intl.NumberFormat('en-US', { style: 'currency', currency: SHOP_CURRENCY });
const SIGNED = new Intl.NumberFormat('en-US', { style: 'currency', currency: SHOP_CURRENCY, signDisplay: 'exceptZero' });
const AMOUNT = new Intl.NumberFormat('en-US', { minimumFractionDigits: 2, maximumFractionDigits: 2 });

export interface MoneyFormat {
  /** '+$12.50' and '-$12.50' for a difference (zero stays '$0.00') */
  signed?: boolean;
  /** false: the amount alone ('1,234.50'), for a column whose header names the currency */
  symbol?: boolean;
}

/** '$1,234.50'; `{ signed: true }` → '+$1,234.50'; `{ symbol: false }` → '1,234.50'. Cents rounded half up. */
export function formatMoney(amount: number, format: MoneyFormat = {}): string {
  // Intl rounds the exact binary value (1.005 is 1.00499…): round first, so $1.005 shows as $1.01
  const cents = round2(amount);
  if (format.symbol === false) return AMOUNT.format(cents);
  return (format.signed ? SIGNED : WITH_SYMBOL).format(cents);
}

/** The amount alone, '1,234.50': for a column or a line that names the currency already. */
export const formatAmount = (amount: number): string => formatMoney(amount, { symbol: false });
