import { compactJson } from '@/features/playground/model/compact-json';
import {
  chargebackSample,
  depositSample,
  fundBatchSample,
  interchangeSample,
  rollingBetaSample,
} from '@/features/playground/model/sample-requests';

// The regression endpoints the playground can call, with the request-body schema each one documents
// and an invented sample scenario to start from.

export type EndpointId = 'fits' | 'form-comparisons' | 'predictions' | 'batch-fits' | 'rolling-fits';

export type EndpointPath = '/v1/fits' | '/v1/form-comparisons' | '/v1/predictions' | '/v1/batch-fits' | '/v1/rolling-fits';

export type EndpointDefinition = {
  id: EndpointId;
  label: string;
  path: EndpointPath;
  /** The request body's schema in the OpenAPI document's components. */
  schemaName: string;
  scenario: string;
  sample: () => unknown;
};

export const endpoints: Record<EndpointId, EndpointDefinition> = {
  fits: {
    id: 'fits',
    label: 'Fit',
    path: '/v1/fits',
    schemaName: 'CreateFitDto',
    scenario: 'Harbourline Pay (invented processor): does the chargeback rate rise with the average ticket?',
    sample: chargebackSample,
  },
  'form-comparisons': {
    id: 'form-comparisons',
    label: 'Form comparison',
    path: '/v1/form-comparisons',
    schemaName: 'CompareFormsDto',
    scenario: 'Brackenfield Savings (invented bank): which functional form links deposit balances to the offered rate?',
    sample: depositSample,
  },
  predictions: {
    id: 'predictions',
    label: 'Prediction',
    path: '/v1/predictions',
    schemaName: 'CreatePredictionDto',
    scenario: 'Tidewater Card (invented issuer): interchange income expected at two levels of card spend.',
    sample: interchangeSample,
  },
  'batch-fits': {
    id: 'batch-fits',
    label: 'Batch fit',
    path: '/v1/batch-fits',
    schemaName: 'CreateBatchFitDto',
    scenario: 'Fernhill Asset Partners (invented): three funds regressed on one benchmark in one call.',
    sample: fundBatchSample,
  },
  'rolling-fits': {
    id: 'rolling-fits',
    label: 'Rolling fit',
    path: '/v1/rolling-fits',
    schemaName: 'CreateRollingFitDto',
    scenario: 'Larkspur Capital (invented): how the fund’s sensitivity to its benchmark drifts over 160 days.',
    sample: rollingBetaSample,
  },
};

export const endpointOrder: EndpointId[] = ['fits', 'form-comparisons', 'predictions', 'batch-fits', 'rolling-fits'];

export function isEndpointId(value: unknown): value is EndpointId {
  return typeof value === 'string' && Object.hasOwn(endpoints, value);
}

/** A request body as the editor shows it. */
export function formatRequest(body: unknown): string {
  return `${compactJson(body)}\n`;
}
