import yargs from 'yargs';
