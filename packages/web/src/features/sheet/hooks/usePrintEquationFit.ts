import { useEffect } from 'react';
import { fitEquationsForPrint } from '../results/fitEquation';

/** Fit the page's equations to the paper each time it is printed (see `fitEquationSteps`). */
export function usePrintEquationFit(): void {
  useEffect(() => {
    const fit = () => fitEquationsForPrint();
    window.addEventListener('beforeprint', fit);
    return () => window.removeEventListener('beforeprint', fit);
  }, []);
}
