export { ClientFarms } from './components/client-farms';
export { HouseReports, ReportLinks } from './components/house-reports';
export { ReportActions, ReportTextEditor, type MemberChoice } from './components/report-actions';
export { ReportView } from './components/report-view';
export { farmReportsQueryOptions, reportQueryOptions } from './queries';
