export { FailedSendList, MessageList } from './components/message-list';
export { inboxQueryOptions, outboxQueryOptions } from './queries';
